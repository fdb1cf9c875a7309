import type { Dispatch } from 'react';
import { scoringSideSchema } from '../../../../shared/domain/season/scoring-pose';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { SCORING_SIDE_LABELS, ScoringSideOptions } from '../../../components/ui/scoring-side-options';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { formatMetres } from '../../../lib/format-number';
import type { ResolvedControls, TargetControls, TargetControlsAction } from '../model/target-controls';
import { AllianceToggle } from './alliance-toggle';

type TargetControlsBarProps = {
  state: TargetControls;
  shown: ResolvedControls;
  dispatch: Dispatch<TargetControlsAction>;
};

type OverrideHintProps = { isOverridden: boolean; profileText: string };

const OverrideHint = ({ isOverridden, profileText }: OverrideHintProps) =>
  isOverridden ? (
    <span className="flex flex-wrap items-center gap-1.5">
      <Badge tone="signal">Override</Badge>
      <span>
        profile: <span className="num">{profileText}</span>
      </span>
    </span>
  ) : (
    <>From the robot profile</>
  );

/** Alliance, and the scoring side and depth, which start from the robot profile and can be tried out here. */
export function TargetControlsBar({ state, shown, dispatch }: TargetControlsBarProps) {
  const isOverridden = shown.isSideOverridden || shown.isDepthOverridden;
  return (
    <div className="flex flex-wrap items-start gap-x-5 gap-y-4">
      <AllianceToggle value={state.alliance} onChange={(alliance) => dispatch({ type: 'alliance', alliance })} />
      <div className="w-40">
        <SelectField
          label="Scoring side"
          name="side"
          value={shown.side}
          onChange={(e) => dispatch({ type: 'side', side: scoringSideSchema.parse(e.target.value) })}
          hint={
            <OverrideHint isOverridden={shown.isSideOverridden} profileText={SCORING_SIDE_LABELS[shown.profileSide]} />
          }
        >
          <ScoringSideOptions />
        </SelectField>
      </div>
      <div className="w-52">
        <TextField
          label="Reef face to centre"
          name="depth"
          unit="m"
          inputMode="decimal"
          autoComplete="off"
          isMono
          value={shown.depthText}
          onChange={(e) => dispatch({ type: 'depth', text: e.target.value })}
          error={shown.depthError ?? undefined}
          hint={
            <OverrideHint isOverridden={shown.isDepthOverridden} profileText={`${formatMetres(shown.profileDepthM)} m`} />
          }
        />
      </div>
      <Button className="mt-7" disabled={!isOverridden} onClick={() => dispatch({ type: 'reset' })}>
        Reset to robot profile
      </Button>
    </div>
  );
}
