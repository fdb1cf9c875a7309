import { ALLIANCES, type Alliance } from '../../../../shared/domain/season/season-profile';
import { ALLIANCE_COLOURS } from '../../../components/field/field-drawing';
import { SegmentedControl } from '../../../components/ui/segmented-control';

export const ALLIANCE_LABELS: Record<Alliance, string> = { blue: 'Blue', red: 'Red' };

/** Blue or red, each with its colour swatch and its name, so colour is never the only cue. */
export function AllianceToggle({ value, onChange }: { value: Alliance; onChange: (alliance: Alliance) => void }) {
  return (
    <SegmentedControl
      legend="Alliance"
      name="alliance"
      value={value}
      onChange={onChange}
      options={ALLIANCES.map((alliance) => ({
        value: alliance,
        accent: ALLIANCE_COLOURS[alliance],
        label: (
          <>
            <span aria-hidden="true" className="size-3 rounded-sm" style={{ background: ALLIANCE_COLOURS[alliance] }} />
            {ALLIANCE_LABELS[alliance]}
          </>
        ),
      }))}
    />
  );
}
