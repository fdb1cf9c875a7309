import { season2025 } from '../../../../shared/domain/season/season-2025';
import { FieldDrawing, type FieldLayer } from '../../../components/field/field-drawing';
import type { RobotTelemetry } from '../../../lib/relay-client';
import { POSE_SIGNALS } from '../../../lib/relay-client';
import { cx } from '../../../lib/cx';
import type { RobotTarget } from '../model/live-view';

// Until the Live page reads the team's robot profile, the footprint is a typical frame with bumpers.
const FOOTPRINT_M = { lengthM: 0.9, widthM: 0.9 };
const ROBOT_COLOUR = '#C98100';
const TRAIL_COLOUR = '#1F2328';
const TARGET_COLOUR = '#1B8A66';

type LiveFieldProps = { robot: string; telemetry: RobotTelemetry | undefined; target: RobotTarget | undefined; isPaused: boolean };

/** The field to scale with the robot's pose, its last five seconds of travel and its current target. */
export function LiveField({ robot, telemetry, target, isPaused }: LiveFieldProps) {
  const values = telemetry?.latest?.values;
  const xM = values?.[POSE_SIGNALS.x];
  const yM = values?.[POSE_SIGNALS.y];
  const headingDeg = values?.[POSE_SIGNALS.heading] ?? 0;
  const hasPose = xM !== undefined && yM !== undefined;
  const layers: FieldLayer[] = [];
  if (target?.pose) layers.push({ kind: 'target', id: 'target', colour: TARGET_COLOUR, isHighlighted: true, ...target.pose });
  if (telemetry && telemetry.trail.length > 1) {
    layers.push({ kind: 'trail', id: 'trail', colour: TRAIL_COLOUR, points: telemetry.trail.map(({ xM: x, yM: y }) => ({ xM: x, yM: y })) });
  }
  if (hasPose) layers.push({ kind: 'robot', id: robot, xM, yM, headingDeg, colour: ROBOT_COLOUR, ...FOOTPRINT_M });

  const title = hasPose
    ? `Field map: ${robot} at x ${xM.toFixed(2)} m, y ${yM.toFixed(2)} m, heading ${headingDeg.toFixed(0)}°${target ? `; target ${target.label}` : ''}`
    : `Field map: no pose from ${robot} yet`;
  return (
    <div className="relative">
      <FieldDrawing season={season2025} layers={layers} title={title} className={cx('block w-full transition-opacity', isPaused && 'opacity-60')} />
      <div className="mt-2 flex flex-wrap items-center justify-between gap-x-4 gap-y-1 text-sm text-asphalt-400">
        <p className="flex items-center gap-4">
          <span className="flex items-center gap-1.5">
            <span aria-hidden="true" className="size-3 rounded-sm ring-1 ring-inset" style={{ backgroundColor: `${ROBOT_COLOUR}59`, color: ROBOT_COLOUR }} />
            {robot}
          </span>
          <span className="flex items-center gap-1.5">
            <span aria-hidden="true" className="h-0.5 w-4 rounded-full bg-asphalt-300" />
            last 5 s
          </span>
          <span className="flex items-center gap-1.5">
            <span aria-hidden="true" className="size-3 rounded-full ring-2 ring-go ring-inset" />
            target
          </span>
        </p>
        {hasPose && (
          <p className="num text-asphalt-300">
            x {xM.toFixed(2)} m · y {yM.toFixed(2)} m · {headingDeg.toFixed(0)}°
          </p>
        )}
      </div>
      {!hasPose && (
        <p className="absolute inset-x-0 top-1/3 mx-auto w-fit rounded-md bg-asphalt-900/90 px-3 py-1.5 text-sm text-asphalt-200">
          Waiting for <code className="text-signal-300">{POSE_SIGNALS.x}</code> and <code className="text-signal-300">{POSE_SIGNALS.y}</code>
        </p>
      )}
    </div>
  );
}
