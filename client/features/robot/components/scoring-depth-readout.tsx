import { formatMetres } from '../../../lib/format-number';
import { liveScoringDepth, type RobotFormValues } from '../model/robot-profile-form';

/** The reef-face-to-centre depth of what is typed, recomputed on every keystroke, with its sum spelled out. */
export function ScoringDepthReadout({ values, savedDepthM }: { values: RobotFormValues; savedDepthM: number }) {
  const depth = liveScoringDepth(values);
  const isChanged = depth !== null && formatMetres(depth.totalM) !== formatMetres(savedDepthM);
  return (
    <div className="flex h-full flex-col justify-center rounded-tile bg-asphalt-900 px-4 py-3 ring-1 ring-asphalt-700">
      <p className="text-xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">Reef face to robot centre</p>
      <output aria-live="polite" className="mt-1 flex flex-wrap items-baseline gap-x-3 gap-y-1">
        {depth === null ? (
          <span className="text-[0.9375rem] text-asphalt-300">Fill in the frame, bumper and standoff to see it.</span>
        ) : (
          <>
            <span className="num text-2xl font-semibold text-signal-300">{formatMetres(depth.totalM)} m</span>
            <span className="num text-sm text-asphalt-400">
              = {formatMetres(depth.standoffM)} standoff + {formatMetres(depth.bumperM)} bumper + {formatMetres(depth.halfFrameM)} half{' '}
              {depth.halfFrameOf}
            </span>
          </>
        )}
      </output>
      {isChanged && <p className="mt-1 text-sm text-asphalt-400">Saved: <span className="num">{formatMetres(savedDepthM)} m</span></p>}
    </div>
  );
}
