import { useState, type FormEvent } from 'react';
import { BRANCH_LETTERS } from '../../../../shared/domain/channels';
import { CORAL_STATIONS } from '../../../../shared/domain/drills/drill-calls';
import { planLongestMs } from '../../../../shared/domain/drills/drill-plan';
import { REEF_LEVELS } from '../../../../shared/domain/season/season-profile';
import type { Drill } from '../../../../shared/schemas/drill';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { SegmentedControl } from '../../../components/ui/segmented-control';
import { TextField } from '../../../components/ui/text-field';
import { isApiError } from '../../../lib/api-error';
import { cx } from '../../../lib/cx';
import { useSaveDrill } from '../api/drills';
import { bodyFromForm, FACES, formFromDrill, NEW_DRILL_FORM, toggleFace, toggleItem, type DrillForm, type FormErrors } from '../model/drill-form';

type DrillEditorProps = { drill: Drill | null; onDone: (saved: Drill | null) => void };

function Chip({ label, isOn, onToggle, ariaLabel }: { label: string; isOn: boolean; onToggle: () => void; ariaLabel?: string }) {
  return (
    <button
      type="button"
      aria-pressed={isOn}
      aria-label={ariaLabel}
      onClick={onToggle}
      className={cx(
        'min-h-11 min-w-11 rounded-lg px-3 font-semibold ring-1 ring-inset transition-colors select-none',
        isOn ? 'bg-signal-500 text-asphalt-950 ring-signal-300' : 'bg-asphalt-800 text-asphalt-200 ring-asphalt-600 hover:bg-asphalt-750',
      )}
    >
      {label}
    </button>
  );
}

function Group({ legend, error, children }: { legend: string; error?: string; children: React.ReactNode }) {
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-sm font-semibold text-asphalt-200">{legend}</legend>
      <div className="flex flex-wrap gap-2">{children}</div>
      {error && <p className="text-sm text-stop">{error}</p>}
    </fieldset>
  );
}

/** Create or edit a drill: name, random targets or a script, pace and count. */
export function DrillEditor({ drill, onDone }: DrillEditorProps) {
  const [form, setForm] = useState<DrillForm>(() => (drill ? formFromDrill(drill) : NEW_DRILL_FORM));
  const [errors, setErrors] = useState<FormErrors>({});
  const save = useSaveDrill(drill?.id ?? null);
  const set = <K extends keyof DrillForm>(key: K, value: DrillForm[K]) => setForm((f) => ({ ...f, [key]: value }));

  const result = bodyFromForm(form);
  const longestS = 'body' in result ? Math.round(planLongestMs(result.body.plan, result.body.pace) / 1000) : null;

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    if ('errors' in result) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    save.mutate(result.body, {
      onSuccess: (saved) => onDone(saved),
      onError: (error) => {
        if (isApiError(error) && error.issues?.length) setErrors({ form: error.issues.map((i) => `${i.path}: ${i.message}`).join('; ') });
      },
    });
  };

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label={drill ? `Edit ${drill.name}` : 'New drill'}>
      <TextField label="Name" name="name" value={form.name} maxLength={80} error={errors.name} onChange={(e) => set('name', e.target.value)} placeholder="e.g. Far faces, high levels" />

      <SegmentedControl
        legend="Calls"
        name="mode"
        value={form.mode}
        options={[
          { value: 'random', label: 'Random from targets' },
          { value: 'scripted', label: 'Scripted' },
        ]}
        onChange={(mode) => set('mode', mode)}
      />

      {form.mode === 'random' ? (
        <div className="flex flex-col gap-4 rounded-xl bg-asphalt-850 p-4 ring-1 ring-asphalt-700">
          <Group legend="Faces (both branches)">
            {FACES.map((face) => (
              <Chip key={face.join('')} label={face.join('')} ariaLabel={`Face ${face.join('')}`} isOn={face.every((b) => form.branches.includes(b))} onToggle={() => set('branches', toggleFace(form.branches, face))} />
            ))}
          </Group>
          <Group legend="Branches">
            {BRANCH_LETTERS.map((b) => (
              <Chip key={b} label={b} ariaLabel={`Branch ${b}`} isOn={form.branches.includes(b)} onToggle={() => set('branches', toggleItem(form.branches, b))} />
            ))}
          </Group>
          <Group legend="Levels">
            {REEF_LEVELS.map((l) => (
              <Chip key={l} label={l} ariaLabel={`Level ${l}`} isOn={form.levels.includes(l)} onToggle={() => set('levels', toggleItem(form.levels, l))} />
            ))}
          </Group>
          <Group legend="Coral stations" error={errors.targets}>
            {CORAL_STATIONS.map((s) => (
              <Chip key={s} label={s === 'left' ? 'Left' : 'Right'} ariaLabel={`${s === 'left' ? 'Left' : 'Right'} station`} isOn={form.stations.includes(s)} onToggle={() => set('stations', toggleItem(form.stations, s))} />
            ))}
          </Group>
          <p className="text-sm text-asphalt-400">Branches and levels chosen together make calls like “L4 · C”; stations are called on their own.</p>
          <div className="max-w-40">
            <TextField label="Number of calls" name="count" inputMode="numeric" value={form.count} error={errors.count} onChange={(e) => set('count', e.target.value)} />
          </div>
        </div>
      ) : (
        <div className="flex flex-col gap-1.5">
          <label htmlFor="drill-script" className="text-sm font-semibold text-asphalt-200">
            Script
          </label>
          <textarea
            id="drill-script"
            name="script"
            rows={6}
            value={form.script}
            onChange={(e) => set('script', e.target.value)}
            aria-invalid={errors.script ? true : undefined}
            aria-describedby={errors.script ? 'script-hint script-error' : 'script-hint'}
            className="rounded-lg bg-asphalt-900 px-3 py-2 font-mono text-asphalt-100 ring-1 ring-asphalt-600 focus:ring-2 focus:ring-signal-400 focus:outline-none"
          />
          <span id="script-hint" className="text-sm text-asphalt-400">
            One call per line, in order: a branch and a level (<code>C L4</code>), one of them (<code>L2</code>), or a station (<code>left</code>, <code>right</code>).
          </span>
          {errors.script && <span id="script-error" className="text-sm text-stop">{errors.script}</span>}
        </div>
      )}

      <SegmentedControl
        legend="Pace"
        name="pace"
        value={form.paceMode}
        options={[
          { value: 'interval', label: 'Seconds between calls' },
          { value: 'on-answer', label: 'Next call on answer' },
        ]}
        onChange={(paceMode) => set('paceMode', paceMode)}
      />
      <div className="max-w-56">
        {form.paceMode === 'interval' ? (
          <TextField label="Seconds between calls" name="intervalS" inputMode="decimal" unit="s" value={form.intervalS} error={errors.intervalS} hint="A call not answered by the next one is a miss." onChange={(e) => set('intervalS', e.target.value)} />
        ) : (
          <TextField label="Seconds to answer" name="limitS" inputMode="decimal" unit="s" value={form.limitS} error={errors.limitS} hint="A call not answered in time is a miss." onChange={(e) => set('limitS', e.target.value)} />
        )}
      </div>
      {longestS !== null && <p className="text-sm text-asphalt-400">A run takes at most about {longestS} s.</p>}

      {(errors.form || (save.error && !errors.form)) && (
        <Notice tone="error" title="The drill was not saved">
          {errors.form ?? save.error?.message}
        </Notice>
      )}
      <div className="flex gap-3">
        <Button type="submit" variant="primary" isPending={save.isPending}>
          {drill ? 'Save drill' : 'Create drill'}
        </Button>
        <Button variant="ghost" onClick={() => onDone(null)}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
