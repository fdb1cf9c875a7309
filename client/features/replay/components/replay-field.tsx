import { useMemo } from 'react';
import type { Alliance } from '../../../../shared/domain/season/season-profile';
import { season2025 } from '../../../../shared/domain/season/season-2025';
import { branchTargets } from '../../../../shared/domain/season/targets';
import { scoringDepthM } from '../../../../shared/domain/robot-profile';
import { DEFAULT_ROBOT_PROFILE } from '../../../../shared/domain/robot-profile';
import { sliceBefore, valueAt, type Series } from '../../../../shared/domain/timeline';
import type { RecordingEvent } from '../../../../shared/schemas/recording';
import { FieldDrawing, type FieldLayer } from '../../../components/field/field-drawing';
import { useReplay } from '../hooks/use-replay';
import { calledTarget, placesReached } from '../model/replay-view';

const FOOTPRINT_M = { lengthM: 0.9, widthM: 0.9 };
const ROBOT_COLOUR = '#C98100';
const TRAIL_COLOUR = '#1F2328';
const CALLED_COLOUR = '#0E7C86';
const REACHED_COLOUR = '#1B8A66';
const TRAIL_S = 5;
const TRAIL_POINTS = 100;

type ReplayFieldProps = {
  robot: string;
  alliance: Alliance;
  pose: { x?: Series; y?: Series; heading?: Series };
  events: readonly RecordingEvent[];
  /** Following a live recording: the robot's newest pose and trail from the relay, ahead of what is stored. */
  live?: LivePose;
};

export type LivePose = { xM: number; yM: number; headingDeg: number; trail: readonly { xM: number; yM: number }[] };

/** The field at the cursor: the robot, its last five seconds, the target called and the places reached. */
export function ReplayField({ robot, alliance, pose, events, live }: ReplayFieldProps) {
  const tS = useReplay((s) => s.tS);
  const targets = useMemo(() => {
    const list = branchTargets(season2025, alliance, { depthM: scoringDepthM(DEFAULT_ROBOT_PROFILE), scoringSide: DEFAULT_ROBOT_PROFILE.scoringSide }).targets;
    return new Map(list.map((t) => [t.branch, t]));
  }, [alliance]);

  const xM = live ? live.xM : pose.x ? valueAt(pose.x, tS) : null;
  const yM = live ? live.yM : pose.y ? valueAt(pose.y, tS) : null;
  const headingDeg = live ? live.headingDeg : ((pose.heading ? valueAt(pose.heading, tS) : null) ?? 0);
  const called = calledTarget(events, tS);
  const reached = placesReached(events, tS);
  const layers: FieldLayer[] = [];
  for (const [i, p] of reached.entries()) {
    const t = targets.get(p.branch);
    if (t) layers.push({ kind: 'target', id: `reached-${p.seq}`, xM: t.x, yM: t.y, colour: REACHED_COLOUR, isHighlighted: i === reached.length - 1 });
  }
  const calledPose = called ? targets.get(called.branch) : undefined;
  if (calledPose) layers.push({ kind: 'target', id: 'called', xM: calledPose.x, yM: calledPose.y, headingDeg: calledPose.headingDeg, colour: CALLED_COLOUR, label: called!.branch });
  if (live) {
    if (live.trail.length > 1) layers.push({ kind: 'trail', id: 'trail', points: [...live.trail], colour: TRAIL_COLOUR });
  } else if (pose.x && pose.y) {
    const { start, end } = sliceBefore(pose.x, tS, TRAIL_S);
    const stride = Math.max(1, Math.ceil((end - start) / TRAIL_POINTS));
    const points = [];
    for (let i = start; i < end; i += stride) {
      const px = pose.x.values[i];
      const py = pose.y.values[i];
      if (px != null && py != null) points.push({ xM: px, yM: py });
    }
    if (xM !== null && yM !== null) points.push({ xM, yM });
    if (points.length > 1) layers.push({ kind: 'trail', id: 'trail', points, colour: TRAIL_COLOUR });
  }
  const hasPose = xM !== null && yM !== null;
  if (hasPose) layers.push({ kind: 'robot', id: robot, xM, yM, headingDeg, colour: ROBOT_COLOUR, ...FOOTPRINT_M });

  const title = hasPose ? `Field map: ${robot} at x ${xM.toFixed(2)} m, y ${yM.toFixed(2)} m, heading ${headingDeg.toFixed(0)}°` : `Field map: no pose for ${robot} here`;
  const lastPlace = reached.at(-1);
  return (
    <div className="relative" data-robot-x={hasPose ? xM.toFixed(3) : undefined} data-robot-y={hasPose ? yM.toFixed(3) : undefined}>
      <FieldDrawing season={season2025} layers={layers} title={title} viewFrom={alliance} className="block w-full rounded-md" />
      <div className="mt-2 flex flex-wrap items-center gap-x-4 gap-y-1 text-sm text-asphalt-400">
        <Key swatch={<span className="size-3 rounded-sm ring-1 ring-inset" style={{ backgroundColor: `${ROBOT_COLOUR}59`, color: ROBOT_COLOUR }} />}>{robot}</Key>
        <Key swatch={<span className="h-0.5 w-4 rounded-full bg-asphalt-300" />}>last {TRAIL_S} s</Key>
        <Key swatch={<span className="size-3 rounded-full ring-2 ring-inset" style={{ color: CALLED_COLOUR }} />}>
          called {called ? <strong className="font-semibold text-asphalt-200">{called.branch} {called.level}</strong> : '—'}
        </Key>
        <Key swatch={<span className="size-3 rounded-full ring-2 ring-inset" style={{ color: REACHED_COLOUR }} />}>
          reached {lastPlace ? <strong className="font-semibold text-asphalt-200">{lastPlace.branch} {lastPlace.level}</strong> : '—'}
        </Key>
      </div>
      {!hasPose && (
        <p className="absolute inset-x-0 top-1/3 mx-auto w-fit rounded-md bg-asphalt-900/90 px-3 py-1.5 text-sm text-asphalt-200">
          No <code className="text-signal-300">drive/pose/x</code> and <code className="text-signal-300">drive/pose/y</code> at this moment
        </p>
      )}
    </div>
  );
}

function Key({ swatch, children }: { swatch: React.ReactNode; children: React.ReactNode }) {
  return (
    <span className="flex items-center gap-1.5">
      <span aria-hidden="true" className="flex">
        {swatch}
      </span>
      {children}
    </span>
  );
}
