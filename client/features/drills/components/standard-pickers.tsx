import { BRANCH_LETTERS } from '../../../../shared/domain/channels';
import { CORAL_STATIONS, type CallPart } from '../../../../shared/domain/drills/drill-calls';
import { REEF_LEVELS } from '../../../../shared/domain/season/season-profile';
import { cx } from '../../../lib/cx';

type StandardPickersProps = {
  parts: readonly CallPart[];
  selection: Partial<Record<CallPart, string>>;
  isOpen: boolean;
  onTap: (part: CallPart, value: string) => void;
};

const GROUPS: Record<CallPart, { legend: string; options: readonly { value: string; label: string }[]; columns: string }> = {
  branch: { legend: 'Branch', options: BRANCH_LETTERS.map((b) => ({ value: b, label: b })), columns: 'grid-cols-6' },
  level: { legend: 'Level', options: [...REEF_LEVELS].reverse().map((l) => ({ value: l, label: l })), columns: 'grid-cols-2' },
  station: { legend: 'Coral station', options: CORAL_STATIONS.map((s) => ({ value: s, label: s === 'left' ? 'Left' : 'Right' })), columns: 'grid-cols-2' },
};

/** Plain branch, level and station pickers on the standard channels, for when the team has no published panel. */
export function StandardPickers({ parts, selection, isOpen, onTap }: StandardPickersProps) {
  return (
    <div className="grid h-full min-h-0 grid-cols-1 gap-4 md:grid-cols-[3fr_2fr_2fr]">
      {parts.map((part) => {
        const group = GROUPS[part];
        return (
          <fieldset key={part} className="flex min-h-0 flex-col rounded-xl bg-asphalt-900 p-3 ring-1 ring-asphalt-700">
            <legend className="px-1 text-sm font-semibold tracking-wide text-asphalt-300 uppercase">{group.legend}</legend>
            <div className={cx('grid flex-1 gap-2', group.columns)}>
              {group.options.map((o) => {
                const isSelected = selection[part] === o.value;
                return (
                  <button
                    key={o.value}
                    type="button"
                    aria-pressed={isSelected}
                    aria-label={`${group.legend} ${o.label}`}
                    // Pointer-down, not click: the reaction time ends when the finger lands.
                    onPointerDown={(e) => {
                      if (e.button !== 0) return;
                      onTap(part, o.value);
                    }}
                    onKeyDown={(e) => {
                      if (e.key === 'Enter' || e.key === ' ') {
                        e.preventDefault();
                        onTap(part, o.value);
                      }
                    }}
                    className={cx(
                      'min-h-16 touch-manipulation rounded-lg text-2xl font-bold transition-colors select-none',
                      isSelected
                        ? 'bg-signal-500 text-asphalt-950 ring-2 ring-signal-300 ring-inset'
                        : 'bg-asphalt-750 text-asphalt-100 ring-1 ring-asphalt-600 ring-inset hover:bg-asphalt-700 active:bg-asphalt-600',
                      !isOpen && 'opacity-60',
                    )}
                  >
                    {o.label}
                  </button>
                );
              })}
            </div>
          </fieldset>
        );
      })}
    </div>
  );
}
