import { useReducer, useState } from 'react';
import type { SeasonProfile } from '../../../../shared/domain/season/season-profile';
import type { RobotProfile } from '../../../../shared/schemas/robot-profile';
import { CopyButton } from '../../../components/ui/copy-button';
import { Loading } from '../../../components/ui/loading';
import { QueryError } from '../../../components/ui/query-error';
import { SCORING_SIDE_LABELS } from '../../../components/ui/scoring-side-options';
import { Spinner } from '../../../components/ui/spinner';
import { cx } from '../../../lib/cx';
import { formatMetres } from '../../../lib/format-number';
import { useBranchTargets } from '../api/season';
import { initialTargetControls, resolveControls, targetControlsReducer, targetsQueryFor } from '../model/target-controls';
import { bumperOutline } from '../model/target-view';
import { ALLIANCE_LABELS } from './alliance-toggle';
import { TargetControlsBar } from './target-controls-bar';
import { TargetsField, type FieldView } from './targets-field';
import { TargetsTable } from './targets-table';

type SeasonTargetsProps = {
  season: SeasonProfile;
  robot: RobotProfile;
  /** When the robot profile was last saved; a new save refetches the targets. */
  profileVersion: string | null;
};

/** The controls, the field with the 12 markers, and the table of targets, pointing at the same branch. */
export function SeasonTargets({ season, robot, profileVersion }: SeasonTargetsProps) {
  const [controls, dispatch] = useReducer(targetControlsReducer, undefined, () => initialTargetControls());
  const [selectedBranch, setSelectedBranch] = useState('A');
  const [hoveredBranch, setHoveredBranch] = useState<string | null>(null);
  const [view, setView] = useState<FieldView>('reef');
  // The close-up sits beside the table from 1280 px, so pointing at a row shows on the field; the whole field
  // needs the page's width, so it goes above the table.
  const isCloseUp = view === 'reef';
  const targets = useBranchTargets(targetsQueryFor(controls), profileVersion);
  const shown = resolveControls(controls, robot);
  const outline = bumperOutline(robot);
  const activeBranch = hoveredBranch ?? selectedBranch;
  const data = targets.data;
  // While an override refetches, the last answer stays up; say whose numbers it shows.
  const isStale = targets.isPlaceholderData || data?.alliance !== controls.alliance;

  return (
    <div className="flex flex-col gap-5">
      <div className="rounded-xl bg-asphalt-850 p-5 shadow-lift ring-1 ring-asphalt-750">
        <TargetControlsBar state={controls} shown={shown} dispatch={dispatch} />
      </div>

      {targets.isError && (
        <QueryError title="Couldn’t compute the targets" error={targets.error} onRetry={() => targets.refetch()} isRetrying={targets.isFetching} />
      )}
      {targets.isPending && <Loading label="Computing the targets…" />}
      {data && (
        <div className={cx('grid items-start gap-5', isCloseUp && 'xl:grid-cols-[minmax(0,1fr)_minmax(0,2fr)]')}>
          <div className={cx(isCloseUp && 'max-w-md xl:sticky xl:top-24 xl:max-w-none')}>
            <TargetsField
              season={season}
              alliance={data.alliance}
              targets={data.targets}
              robot={outline}
              robotName={robot.name}
              activeBranch={activeBranch}
              view={view}
              onViewChange={setView}
              onHover={setHoveredBranch}
              onSelect={setSelectedBranch}
            />
          </div>
          <div className="flex min-w-0 flex-col gap-3">
            <div className="flex min-h-11 flex-wrap items-center justify-between gap-3">
              <p className="text-[0.9375rem] text-asphalt-300" aria-live="polite">
                <span className="font-semibold text-asphalt-100">{ALLIANCE_LABELS[data.alliance]} alliance</span> ·{' '}
                {SCORING_SIDE_LABELS[data.side].toLowerCase()} side to the reef · centre{' '}
                <span className="num text-asphalt-100">{formatMetres(data.depthM)} m</span> from the face
                {isStale && targets.isFetching && (
                  <span className="ml-2 inline-flex items-center gap-1.5 text-sm text-asphalt-400">
                    <Spinner className="size-3.5 text-signal-500" /> Updating…
                  </span>
                )}
              </p>
              <CopyButton text={JSON.stringify(data, null, 2)} label="Copy as JSON" variant="secondary" />
            </div>
            <TargetsTable
              targets={data.targets}
              caption={`Branch targets, ${ALLIANCE_LABELS[data.alliance].toLowerCase()} alliance: robot centre in field metres and heading in degrees; level heights in metres`}
              selectedBranch={selectedBranch}
              activeBranch={activeBranch}
              onHover={setHoveredBranch}
              onSelect={setSelectedBranch}
            />
          </div>
        </div>
      )}
    </div>
  );
}
