import { QueryGate } from '../../../components/ui/query-gate';
import { SCORING_SIDE_LABELS } from '../../../components/ui/scoring-side-options';
import { formatMetres } from '../../../lib/format-number';
import { useRobotProfile } from '../api/robot-profile';
import { LastChanged } from './last-changed';

/** The robot profile in one line, for pages that link to it. */
export function RobotSummary() {
  const robot = useRobotProfile();
  return (
    <QueryGate query={robot} loadingLabel="Loading the robot profile…" errorTitle="Couldn’t load the robot profile">
      {(stored) => {
        const p = stored.profile;
        return (
          <div className="flex flex-col gap-1">
            <p className="text-[0.9375rem] text-asphalt-200">
              <span className="font-semibold text-asphalt-100">{p.name}</span>:{' '}
              <span className="num">
                {formatMetres(p.frameLengthM)} × {formatMetres(p.frameWidthM)} m
              </span>{' '}
              frame, scores from the {SCORING_SIDE_LABELS[p.scoringSide].toLowerCase()}, centre{' '}
              <span className="num">{formatMetres(stored.scoringDepthM)} m</span> from the reef face.
            </p>
            <LastChanged stored={stored} />
          </div>
        );
      }}
    </QueryGate>
  );
}
