import { Link } from 'react-router-dom';
import type { ReviewCycle } from '../../../../shared/schemas/cycle';
import { TableFrame } from '../../../components/ui/table-frame';
import { formatClock, formatSeconds, groupLabel, matchShort, OUTCOME_LABELS, replayLink } from '../model/cycles-view';

/** The slowest place attempts, each linked into the replay at the cycle's start. */
export function SlowestTable({ cycles, formatDate }: { cycles: readonly ReviewCycle[]; formatDate: (iso: string) => string }) {
  return (
    <TableFrame
      caption="Slowest cycles"
      isDense
      columns={[
        { label: 'Match' },
        { label: 'Cycle', isEnd: true },
        { label: 'Duration', isEnd: true },
        { label: 'Piece' },
        { label: 'Level' },
        { label: 'Face' },
        { label: 'Station' },
        { label: 'Outcome' },
        { label: 'Replay', isLabelHidden: true },
      ]}
    >
      {cycles.map((c) => (
        <tr key={`${c.recordingId}:${c.index}`} data-slow-cycle="" className="[&>td]:whitespace-nowrap">
          <td className="px-2 py-1.5 whitespace-nowrap">
            <span className="font-semibold text-asphalt-100">{matchShort(c) ?? 'Recording'}</span>
            <span className="ml-1.5 text-sm text-asphalt-400">{formatDate(c.recordingStartedAt)}</span>
          </td>
          <td className="num px-2 py-1.5 text-right">{c.index + 1}</td>
          <td className="num px-2 py-1.5 text-right font-semibold text-signal-300">{formatSeconds(c.durationS)}</td>
          <td className="px-2 py-1.5 capitalize">{c.piece}</td>
          <td className="num px-2 py-1.5">{c.level ?? '—'}</td>
          <td className="num px-2 py-1.5">{c.face ?? '—'}</td>
          <td className="px-2 py-1.5 whitespace-nowrap">{c.station ? groupLabel('station', c.station) : '—'}</td>
          <td className="px-2 py-1.5">{OUTCOME_LABELS[c.outcome]}</td>
          <td className="px-2 py-1.5 text-right">
            <Link
              to={replayLink(c.recordingId, c.startS)}
              className="inline-flex min-h-11 items-center rounded-md px-2 font-semibold whitespace-nowrap text-signal-300 underline-offset-2 hover:underline focus-visible:outline-2 focus-visible:outline-signal-400"
              aria-label={`Replay ${matchShort(c) ?? 'the recording'} cycle ${c.index + 1} from ${formatClock(c.startS)}`}
            >
              Replay from {formatClock(c.startS)}
            </Link>
          </td>
        </tr>
      ))}
    </TableFrame>
  );
}
