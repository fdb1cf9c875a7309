import { RECORDING_KINDS } from '../../../../shared/schemas/recording';
import { Button } from '../../../components/ui/button';
import { buttonClasses } from '../../../components/ui/button-styles';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { reviewCsvUrl } from '../api/cycles';
import { activeReviewFilters, EMPTY_REVIEW, type ReviewView } from '../model/review-query';

const KIND_LABELS: Record<(typeof RECORDING_KINDS)[number], string> = { match: 'Match', practice: 'Practice', drill: 'Drill', simulated: 'Simulated' };

type ReviewFiltersProps = {
  view: ReviewView;
  options: { events: readonly string[]; operators: readonly string[] };
  onChange: (view: ReviewView) => void;
};

/** The review's filters; each change goes into the address at once. A chosen value no longer offered stays selectable. */
export function ReviewFilters({ view, options, onChange }: ReviewFiltersProps) {
  const count = activeReviewFilters(view);
  const events = view.event && !options.events.includes(view.event) ? [view.event, ...options.events] : options.events;
  const operators = view.operator && !options.operators.includes(view.operator) ? [view.operator, ...options.operators] : options.operators;
  return (
    <form role="search" aria-label="Filter cycles" className="grid grid-cols-2 gap-3 md:grid-cols-3 lg:grid-cols-[minmax(0,2fr)_repeat(4,minmax(0,1fr))] lg:items-end" onSubmit={(e) => e.preventDefault()}>
      <SelectField label="Event" name="event" value={view.event} onChange={(e) => onChange({ ...view, event: e.target.value })}>
        <option value="">Every event</option>
        {events.map((e) => (
          <option key={e} value={e}>
            {e}
          </option>
        ))}
      </SelectField>
      <TextField label="From" name="from" type="date" isMono value={view.from} max={view.to || undefined} onChange={(e) => onChange({ ...view, from: e.target.value })} />
      <TextField label="To" name="to" type="date" isMono value={view.to} min={view.from || undefined} onChange={(e) => onChange({ ...view, to: e.target.value })} />
      <SelectField label="Kind" name="kind" value={view.kind} onChange={(e) => onChange({ ...view, kind: RECORDING_KINDS.find((k) => k === e.target.value) ?? '' })}>
        <option value="">Any kind</option>
        {RECORDING_KINDS.map((k) => (
          <option key={k} value={k}>
            {KIND_LABELS[k]}
          </option>
        ))}
      </SelectField>
      <SelectField label="Operator" name="operator" value={view.operator} onChange={(e) => onChange({ ...view, operator: e.target.value })}>
        <option value="">Any operator</option>
        {operators.map((o) => (
          <option key={o} value={o}>
            {o}
          </option>
        ))}
      </SelectField>
      <div className="col-span-full flex flex-wrap items-center justify-end gap-2">
        <Button variant="ghost" disabled={count === 0} onClick={() => onChange(EMPTY_REVIEW)}>
          Clear filters{count > 0 && <span className="num text-asphalt-400">({count})</span>}
        </Button>
        <a className={buttonClasses('secondary')} href={reviewCsvUrl(view)} download>
          Export CSV
        </a>
      </div>
    </form>
  );
}
