import { useId, useMemo, useState } from 'react';
import type { Signal } from '../../../../shared/protocol/messages';
import { buttonClasses } from '../../../components/ui/button-styles';
import { signalTree, type SignalGroup } from '../model/replay-view';

const MAX_PER_PANE = 6;

type SignalPickerProps = { label: string; signals: readonly Signal[]; chosen: readonly string[]; onChange: (names: string[]) => void };

/** A searchable tree of the recording's signals, grouped by their `/` path; ticking one adds it to the pane. */
export function SignalPicker({ label, signals, chosen, onChange }: SignalPickerProps) {
  const [search, setSearch] = useState('');
  const searchId = useId();
  const tree = useMemo(() => signalTree(signals, search), [signals, search]);
  const toggle = (name: string) =>
    onChange(chosen.includes(name) ? chosen.filter((n) => n !== name) : [...chosen, name].slice(-MAX_PER_PANE));

  return (
    <details className="group relative">
      <summary className={buttonClasses('ghost', 'sm', 'min-h-8 cursor-pointer list-none px-2 text-xs [&::-webkit-details-marker]:hidden')} aria-label={label}>
        Signals ▾
      </summary>
      <div className="absolute top-full right-0 z-20 mt-1 w-80 rounded-lg bg-asphalt-800 p-3 shadow-lift ring-1 ring-asphalt-600">
        <label htmlFor={searchId} className="text-xs font-semibold text-asphalt-300">
          Find a signal
        </label>
        <input
          id={searchId}
          type="search"
          value={search}
          onChange={(e) => setSearch(e.target.value)}
          placeholder="e.g. elevator current"
          className="mt-1 w-full rounded-md bg-asphalt-900 px-2.5 py-1.5 text-sm text-asphalt-100 ring-1 ring-asphalt-600 ring-inset placeholder:text-asphalt-500 focus:ring-signal-500"
        />
        <p className="mt-1.5 text-2xs text-asphalt-500">Up to {MAX_PER_PANE} per pane; ticking a seventh drops the oldest.</p>
        <div className="mt-2 max-h-80 overflow-y-auto pr-1">
          {tree.groups.length === 0 && tree.signals.length === 0 ? (
            <p className="py-3 text-center text-sm text-asphalt-400">No signal matches “{search}”.</p>
          ) : (
            <Group group={tree} chosen={chosen} onToggle={toggle} isOpen={search !== ''} />
          )}
        </div>
      </div>
    </details>
  );
}

function Group({ group, chosen, onToggle, isOpen }: { group: SignalGroup; chosen: readonly string[]; onToggle: (name: string) => void; isOpen: boolean }) {
  return (
    <ul className="flex flex-col gap-0.5">
      {group.signals.map((s) => (
        <li key={s.name}>
          <label className="flex cursor-pointer items-center gap-2 rounded px-1.5 py-1 text-sm text-asphalt-200 hover:bg-asphalt-750">
            <input type="checkbox" checked={chosen.includes(s.name)} onChange={() => onToggle(s.name)} className="accent-signal-500" />
            <code className="min-w-0 flex-1 truncate text-xs">{s.name.split('/').at(-1)}</code>
            <span className="text-2xs text-asphalt-500">{s.unit || s.type}</span>
          </label>
        </li>
      ))}
      {group.groups.map((g) => (
        <li key={g.path}>
          <details open={isOpen || g.groups.length + g.signals.length <= 3 || undefined}>
            <summary className="cursor-pointer rounded px-1.5 py-1 text-xs font-semibold tracking-wide text-asphalt-300 hover:bg-asphalt-750">
              {g.path.split('/').at(-1)}/
            </summary>
            <div className="ml-3 border-l border-asphalt-700 pl-1.5">
              <Group group={g} chosen={chosen} onToggle={onToggle} isOpen={isOpen} />
            </div>
          </details>
        </li>
      ))}
    </ul>
  );
}
