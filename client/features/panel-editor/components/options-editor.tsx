import { useEffect, useState } from 'react';
import type { TileKind, TileOption } from '../../../../shared/schemas/panel';
import { Button } from '../../../components/ui/button';
import { controlClasses } from '../../../components/ui/field';
import { cx } from '../../../lib/cx';
import { checkOptions, optionLimits } from '../model/property-rules';

type OptionsEditorProps = { kind: TileKind; options: readonly TileOption[]; onCommit: (options: TileOption[]) => void; onBlur: () => void; isDisabled: boolean };

/** The buttons of a picker or choice pad: label (what the operator reads) and value (what the robot gets). */
export function OptionsEditor({ kind, options, onCommit, onBlur, isDisabled }: OptionsEditorProps) {
  const [rows, setRows] = useState<TileOption[]>(() => options.map((o) => ({ ...o })));
  const committed = JSON.stringify(options);
  useEffect(() => {
    setRows((r) => (checkOptions(r, kind).ok && JSON.stringify(r) === committed ? r : (JSON.parse(committed) as TileOption[])));
  }, [committed, kind]);
  const { problems } = checkOptions(rows, kind);
  const { max } = optionLimits(kind);

  function change(next: TileOption[]) {
    setRows(next);
    if (checkOptions(next, kind).ok && JSON.stringify(next) !== committed) onCommit(next);
  }

  return (
    <fieldset disabled={isDisabled} className="flex flex-col gap-2">
      <legend className="mb-1 text-sm font-semibold text-asphalt-200">Options</legend>
      <p className="-mt-1 text-sm text-asphalt-400">Top to bottom as the operator sees them. The value is what the robot receives.</p>
      <div className="grid grid-cols-[1fr_1fr_auto] gap-x-2 gap-y-1.5 text-2xs font-semibold tracking-[0.12em] text-asphalt-400 uppercase">
        <span>Label</span>
        <span>Value</span>
        <span className="sr-only">Order and removal</span>
      </div>
      <ol className="flex flex-col gap-1.5">
        {rows.map((o, i) => {
          const p = problems.rows[i] ?? {};
          return (
            <li key={i} className="grid grid-cols-[1fr_1fr_auto] items-start gap-2">
              <div>
                <input
                  aria-label={`Option ${i + 1} label`}
                  aria-invalid={p.label ? true : undefined}
                  value={o.label}
                  maxLength={40}
                  className={cx(controlClasses, 'min-h-10 px-2 text-sm')}
                  onChange={(e) => change(rows.map((r, j) => (j === i ? { ...r, label: e.target.value } : r)))}
                  onBlur={onBlur}
                />
                {p.label && <p className="mt-0.5 text-xs font-medium text-stop">{p.label}</p>}
              </div>
              <div>
                <input
                  aria-label={`Option ${i + 1} value`}
                  aria-invalid={p.value ? true : undefined}
                  value={o.value}
                  maxLength={64}
                  className={cx(controlClasses, 'num min-h-10 px-2 text-sm')}
                  onChange={(e) => change(rows.map((r, j) => (j === i ? { ...r, value: e.target.value } : r)))}
                  onBlur={onBlur}
                />
                {p.value && <p className="mt-0.5 text-xs font-medium text-stop">{p.value}</p>}
              </div>
              <div className="flex">
                <IconButton label={`Move option ${i + 1} up`} isDisabled={i === 0} onClick={() => change(swap(rows, i, i - 1))} path="M8 12V4M4.5 7.5 8 4l3.5 3.5" />
                <IconButton label={`Remove option ${i + 1}`} onClick={() => change(rows.filter((_, j) => j !== i))} path="M4 4l8 8M12 4l-8 8" />
              </div>
            </li>
          );
        })}
      </ol>
      {problems.list && (
        <p role="alert" className="text-sm font-medium text-stop">
          {problems.list}
        </p>
      )}
      <Button size="sm" variant="ghost" className="self-start" disabled={rows.length >= max} onClick={() => change([...rows, { label: `Option ${rows.length + 1}`, value: `option-${rows.length + 1}` }])}>
        + Add option
      </Button>
    </fieldset>
  );
}

function swap<T>(list: readonly T[], a: number, b: number): T[] {
  const next = [...list];
  [next[a], next[b]] = [next[b]!, next[a]!];
  return next;
}

export function IconButton({ label, path, onClick, isDisabled }: { label: string; path: string; onClick: () => void; isDisabled?: boolean }) {
  return (
    <button
      type="button"
      aria-label={label}
      title={label}
      disabled={isDisabled}
      onClick={onClick}
      className="grid size-10 place-items-center rounded-md text-asphalt-300 hover:bg-asphalt-750 hover:text-asphalt-100 disabled:opacity-30"
    >
      <svg viewBox="0 0 16 16" aria-hidden="true" className="size-4" fill="none" stroke="currentColor" strokeWidth="1.75" strokeLinecap="round" strokeLinejoin="round">
        <path d={path} />
      </svg>
    </button>
  );
}
