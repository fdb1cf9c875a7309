import type { RecordingDetail } from '../../../../shared/schemas/recording';
import { formatDateTime } from '../../../lib/format-time';
import { formatDuration, KIND_LABELS, matchLabel, SOURCE_LABELS } from '../model/format';
import { AllianceChip } from './alliance-chip';

/** The metadata of one recording as a definition list. */
export function RecordingFacts({ recording: r }: { recording: RecordingDetail }) {
  const facts: [string, React.ReactNode][] = [
    ['Started', formatDateTime(r.startedAt)],
    ['Ended', r.endedAt ? formatDateTime(r.endedAt) : 'Still recording'],
    ['Duration', <span className="num">{formatDuration(r.durationS)}</span>],
    ['Kind', `${KIND_LABELS[r.kind]} · from ${SOURCE_LABELS[r.source].toLowerCase()}`],
    ['Event', r.metadata.event ?? '—'],
    ['Match', matchLabel(r.metadata)?.long ?? '—'],
    ['Alliance', <AllianceChip metadata={r.metadata} />],
    ['Robot', r.robot],
    ['Operator', r.metadata.operatorName ?? '—'],
    ['Tags', r.metadata.tags.length > 0 ? r.metadata.tags.join(', ') : '—'],
    ['Signals', <span className="num">{r.signalCount}</span>],
    ['Events', <span className="num">{r.eventCount}</span>],
  ];
  return (
    <dl className="grid gap-x-6 gap-y-4 sm:grid-cols-2 lg:grid-cols-3">
      {facts.map(([label, value]) => (
        <div key={label}>
          <dt className="text-xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">{label}</dt>
          <dd className="mt-1 text-asphalt-100">{value}</dd>
        </div>
      ))}
      {r.metadata.notes && (
        <div className="sm:col-span-2 lg:col-span-3">
          <dt className="text-xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">Notes</dt>
          <dd className="mt-1 whitespace-pre-wrap text-asphalt-200">{r.metadata.notes}</dd>
        </div>
      )}
    </dl>
  );
}
