import { useEffect, useState } from 'react';
import { ALLIANCES } from '../../../../shared/domain/season/season-profile';
import { RECORDING_KINDS } from '../../../../shared/schemas/recording';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { ALLIANCE_LABELS, KIND_LABELS } from '../model/format';
import { activeFilterCount, DEFAULT_VIEW, withFilters, type RecordingView } from '../model/list-query';

type RecordingFiltersProps = { view: RecordingView; onChange: (view: RecordingView) => void };

type TextKey = 'q' | 'event' | 'tag';

/** Typed filters wait for a pause in typing before they change the URL; picked ones apply at once. */
function useTypedFilter(view: RecordingView, key: TextKey, onChange: (view: RecordingView) => void) {
  const [text, setText] = useState(view[key]);
  const committed = view[key];
  useEffect(() => setText(committed), [committed]);
  useEffect(() => {
    if (text === view[key]) return;
    const timer = setTimeout(() => onChange(withFilters(view, { [key]: text })), 350);
    return () => clearTimeout(timer);
  }, [text, view, key, onChange]);
  return { value: text, onChange: (e: React.ChangeEvent<HTMLInputElement>) => setText(e.target.value) };
}

export function RecordingFilters({ view, onChange }: RecordingFiltersProps) {
  const q = useTypedFilter(view, 'q', onChange);
  const event = useTypedFilter(view, 'event', onChange);
  const tag = useTypedFilter(view, 'tag', onChange);
  const count = activeFilterCount(view);

  return (
    <form role="search" aria-label="Filter recordings" className="flex flex-col gap-3" onSubmit={(e) => e.preventDefault()}>
      <div className="grid gap-3 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <TextField label="Search" name="q" type="search" placeholder="Robot, event, operator, notes or tag" maxLength={120} {...q} />
        <TextField label="Event" name="event" placeholder="Part of the name" maxLength={120} {...event} />
      </div>
      <div className="grid grid-cols-2 gap-3 md:grid-cols-3 xl:grid-cols-[repeat(5,minmax(0,1fr))_auto] xl:items-end">
        <SelectField
          label="Kind"
          name="kind"
          value={view.kind}
          onChange={(e) => onChange(withFilters(view, { kind: RECORDING_KINDS.find((k) => k === e.target.value) ?? '' }))}
        >
          <option value="">Any kind</option>
          {RECORDING_KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Alliance"
          name="alliance"
          value={view.alliance}
          onChange={(e) => onChange(withFilters(view, { alliance: ALLIANCES.find((a) => a === e.target.value) ?? '' }))}
        >
          <option value="">Either alliance</option>
          {ALLIANCES.map((a) => (
            <option key={a} value={a}>
              {ALLIANCE_LABELS[a]}
            </option>
          ))}
        </SelectField>
        <TextField label="Tag" name="tag" placeholder="Exact tag" maxLength={32} {...tag} />
        <TextField
          label="From"
          name="from"
          type="date"
          isMono
          value={view.from}
          max={view.to || undefined}
          onChange={(e) => onChange(withFilters(view, { from: e.target.value }))}
        />
        <TextField
          label="To"
          name="to"
          type="date"
          isMono
          value={view.to}
          min={view.from || undefined}
          onChange={(e) => onChange(withFilters(view, { to: e.target.value }))}
        />
        <Button variant="ghost" disabled={count === 0} onClick={() => onChange({ ...DEFAULT_VIEW, sort: view.sort, pageSize: view.pageSize })}>
          Clear filters{count > 0 && <span className="num text-asphalt-400">({count})</span>}
        </Button>
      </div>
    </form>
  );
}
