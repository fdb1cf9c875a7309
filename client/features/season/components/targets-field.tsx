import type { Alliance, SeasonProfile } from '../../../../shared/domain/season/season-profile';
import type { BranchTarget } from '../../../../shared/domain/season/targets';
import { ALLIANCE_COLOURS, FieldDrawing } from '../../../components/field/field-drawing';
import { SegmentedControl } from '../../../components/ui/segmented-control';
import { reefWindow, targetLayers, type RobotOutline } from '../model/target-view';
import { ALLIANCE_LABELS } from './alliance-toggle';

// Pitwall's signal amber: apart from both alliance colours, and light enough to see through on the field.
const ROBOT_COLOUR = '#F5A30F';

export type FieldView = 'reef' | 'field';

type TargetsFieldProps = {
  season: SeasonProfile;
  alliance: Alliance;
  targets: readonly BranchTarget[];
  robot: RobotOutline;
  robotName: string;
  activeBranch: string | null;
  view: FieldView;
  onViewChange: (view: FieldView) => void;
  onHover: (branch: string | null) => void;
  onSelect: (branch: string) => void;
};

/** The field to scale with the 12 markers and the robot's bumper outline on the active branch. */
export function TargetsField(props: TargetsFieldProps) {
  const { season, alliance, targets, robot, robotName, activeBranch, view, onViewChange, onHover, onSelect } = props;
  const layers = targetLayers(targets, {
    targetColour: ALLIANCE_COLOURS[alliance],
    robotColour: ROBOT_COLOUR,
    activeBranch,
    robot,
  });
  const allianceName = ALLIANCE_LABELS[alliance].toLowerCase();
  return (
    <figure className="flex flex-col gap-3">
      <SegmentedControl
        legend="Field view"
        isLegendHidden
        name="field-view"
        value={view}
        onChange={onViewChange}
        options={[
          { value: 'reef', label: 'Reef close-up' },
          { value: 'field', label: 'Whole field' },
        ]}
      />
      <div className="overflow-hidden rounded-tile bg-asphalt-900 ring-1 ring-asphalt-700">
        <FieldDrawing
          season={season}
          layers={layers}
          window={view === 'reef' ? reefWindow(season, alliance, targets, robot) : undefined}
          title={`Branch targets on the ${allianceName} reef${activeBranch ? `, ${robotName} on branch ${activeBranch}` : ''}`}
          className={view === 'reef' ? 'aspect-square w-full' : 'aspect-[2.1] w-full'}
          onTargetHover={onHover}
          onTargetSelect={onSelect}
          viewFrom={alliance}
        />
      </div>
      <figcaption className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-asphalt-400">
        <span className="flex items-center gap-1.5">
          <svg viewBox="0 0 12 12" aria-hidden="true" className="size-3">
            <circle cx="6" cy="6" r="4.5" fill="none" stroke={ALLIANCE_COLOURS[alliance]} strokeWidth="1.6" />
          </svg>
          Robot centre for a branch
        </span>
        <span className="flex items-center gap-1.5">
          <span aria-hidden="true" className="size-3 rounded-xs border border-signal-500 bg-signal-500/35" />
          {robotName}, bumper to bumper
        </span>
        <span>
          To scale, seen from above with the {allianceName} alliance wall on the left; the table gives blue-origin field
          coordinates.
        </span>
      </figcaption>
    </figure>
  );
}
