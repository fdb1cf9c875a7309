import { Link } from 'react-router-dom';
import type { RecordingSort, RecordingSummary } from '../../../../shared/schemas/recording';
import { Badge } from '../../../components/ui/badge';
import { cx } from '../../../lib/cx';
import { formatDateTime } from '../../../lib/format-time';
import { formatDuration, KIND_LABELS, matchLabel, SOURCE_LABELS } from '../model/format';
import type { SortField } from '../model/list-query';
import { AllianceChip } from './alliance-chip';
import { PlainHeader, SortHeader } from './sort-header';

type RecordingsTableProps = {
  items: readonly RecordingSummary[];
  sort: RecordingSort;
  onSort: (field: SortField) => void;
  selected: ReadonlySet<string>;
  onToggle: (id: string) => void;
  onToggleAll: (ids: readonly string[], isOn: boolean) => void;
  highlightId: string | null;
};

const KIND_TONES = { match: 'signal', practice: 'neutral', drill: 'go', simulated: 'sky' } as const;

export function RecordingsTable({ items, sort, onSort, selected, onToggle, onToggleAll, highlightId }: RecordingsTableProps) {
  const ids = items.map((r) => r.id);
  const selectedHere = ids.filter((id) => selected.has(id)).length;
  return (
    <div className="overflow-x-auto rounded-tile ring-1 ring-asphalt-700">
      <table className="w-full text-left text-[0.9375rem]">
        <caption className="sr-only">Recordings of the team, one row each</caption>
        <thead className="bg-asphalt-800 text-xs text-asphalt-400">
          <tr>
            <th scope="col" className="w-11 px-3">
                <input
                  type="checkbox"
                  aria-label="Select all recordings on this page"
                  className="size-5 accent-signal-500"
                  checked={selectedHere > 0 && selectedHere === ids.length}
                  ref={(el) => {
                    if (el) el.indeterminate = selectedHere > 0 && selectedHere < ids.length;
                  }}
                  onChange={(e) => onToggleAll(ids, e.target.checked)}
                />
            </th>
            <SortHeader label="Started" field="startedAt" sort={sort} onSort={onSort} />
            <SortHeader label="Event" field="event" sort={sort} onSort={onSort} />
            <SortHeader label="Match" field="matchNumber" sort={sort} onSort={onSort} />
            <PlainHeader label="Kind" />
            <PlainHeader label="Alliance" />
            <PlainHeader label="Robot" />
            <PlainHeader label="Operator" />
            <SortHeader label="Duration" field="durationS" sort={sort} onSort={onSort} isEnd />
            <PlainHeader label="Tags" />
            <PlainHeader label="Status" />
          </tr>
        </thead>
        <tbody className="divide-y divide-asphalt-750">
          {items.map((r) => (
            <RecordingRow
              key={r.id}
              recording={r}
              isSelected={selected.has(r.id)}
              isHighlighted={r.id === highlightId}
              onToggle={() => onToggle(r.id)}
            />
          ))}
        </tbody>
      </table>
    </div>
  );
}

type RecordingRowProps = { recording: RecordingSummary; isSelected: boolean; isHighlighted: boolean; onToggle: () => void };

function RecordingRow({ recording: r, isSelected, isHighlighted, onToggle }: RecordingRowProps) {
  const match = matchLabel(r.metadata);
  const started = formatDateTime(r.startedAt);
  return (
    <tr
      data-recording-id={r.id}
      className={cx(
        'bg-asphalt-850 hover:bg-asphalt-800/60',
        isSelected && 'bg-signal-950/60 hover:bg-signal-950',
        isHighlighted && 'bg-go-950 outline-2 -outline-offset-2 outline-go',
      )}
    >
      <td className="px-3">
          <input
            type="checkbox"
            aria-label={`Select recording of ${started}`}
            className="size-5 accent-signal-500"
            checked={isSelected}
            onChange={onToggle}
          />
      </td>
      <th scope="row" className="px-2.5 py-2.5 font-normal whitespace-nowrap">
        <Link
          to={`/recordings/${r.id}`}
          className="font-semibold text-asphalt-100 underline decoration-asphalt-600 underline-offset-4 hover:text-signal-300 hover:decoration-signal-400"
        >
          {started}
        </Link>
        {isHighlighted && (
          <Badge tone="go" className="ml-2">
            Just uploaded
          </Badge>
        )}
      </th>
      <td className="max-w-44 truncate px-2.5 py-2.5 text-asphalt-200" title={r.metadata.event ?? undefined}>
        {r.metadata.event ?? <span className="text-asphalt-500">—</span>}
      </td>
      <td className="px-2.5 py-2.5 whitespace-nowrap">
        {match ? (
          <abbr title={match.long} className="num no-underline">
            {match.short}
          </abbr>
        ) : (
          <span className="text-asphalt-500">—</span>
        )}
      </td>
      <td className="px-2.5 py-2.5">
        <Badge tone={KIND_TONES[r.kind]}>{KIND_LABELS[r.kind]}</Badge>
      </td>
      <td className="px-2.5 py-2.5">
        <AllianceChip metadata={r.metadata} />
      </td>
      <td className="px-2.5 py-2.5 whitespace-nowrap text-asphalt-200">{r.robot}</td>
      <td className="px-2.5 py-2.5 whitespace-nowrap text-asphalt-300">
        {r.metadata.operatorName ?? <span className="text-asphalt-500">—</span>}
      </td>
      <td className="num px-2.5 py-2.5 text-right whitespace-nowrap text-asphalt-200">{formatDuration(r.durationS)}</td>
      <td className="px-2.5 py-2.5">
        {r.metadata.tags.length > 0 ? (
          <ul className="flex max-w-56 flex-wrap gap-1">
            {r.metadata.tags.map((t) => (
              <li key={t} className="rounded bg-asphalt-750 px-1.5 py-0.5 text-xs text-asphalt-200 ring-1 ring-asphalt-600">
                {t}
              </li>
            ))}
          </ul>
        ) : (
          <span className="text-asphalt-500">—</span>
        )}
      </td>
      <td className="px-2.5 py-2.5 whitespace-nowrap">
        {r.status === 'recording' ? (
          <span className="inline-flex items-center gap-1.5 text-sm font-semibold text-stop">
            <span aria-hidden="true" className="size-2 animate-pulse rounded-full bg-stop" />
            Recording
          </span>
        ) : (
          <span className="text-sm text-asphalt-300">
            Finished <span className="text-asphalt-500">· {SOURCE_LABELS[r.source]}</span>
          </span>
        )}
      </td>
    </tr>
  );
}
