import type { DrillResult } from '../../../../shared/schemas/drill';
import { Badge } from '../../../components/ui/badge';
import { TableFrame } from '../../../components/ui/table-frame';
import { formatDateTime } from '../../../lib/format-time';
import { formatAccuracy, formatReaction } from '../model/format';

const COLUMNS = [
  { label: 'When' },
  { label: 'Operator' },
  { label: 'Drill' },
  { label: 'Calls', isEnd: true },
  { label: 'Median', isEnd: true },
  { label: 'p90', isEnd: true },
  { label: 'Accuracy', isEnd: true },
  { label: 'Misses', isEnd: true },
] as const;

/** The newest runs first, with how each was run. */
export function ResultsTable({ results }: { results: readonly DrillResult[] }) {
  const newestFirst = [...results].reverse().slice(0, 15);
  return (
    <TableFrame caption="Recent drill runs" columns={COLUMNS} isDense>
      {newestFirst.map((r) => (
        <tr key={r.id} className="bg-asphalt-900">
          <td className="num px-2 py-2 whitespace-nowrap text-asphalt-300">{formatDateTime(r.startedAt)}</td>
          <td className="px-2 py-2 font-semibold whitespace-nowrap">{r.operator.name}</td>
          <td className="px-2 py-2">
            <span className="flex flex-wrap items-center gap-1.5">
              {r.drillName}
              {r.mode === 'coached' && <Badge tone="sky">Coached{r.coachName ? ` by ${r.coachName}` : ''}</Badge>}
              {r.isSimulatorDriven && <Badge tone="signal">Simulator</Badge>}
              {!r.isComplete && <Badge>Stopped</Badge>}
            </span>
          </td>
          <td className="num px-2 py-2 text-right whitespace-nowrap">{r.stats.callCount}</td>
          <td className="num px-2 py-2 text-right whitespace-nowrap text-signal-300">{formatReaction(r.stats.medianMs)}</td>
          <td className="num px-2 py-2 text-right whitespace-nowrap">{formatReaction(r.stats.p90Ms)}</td>
          <td className="num px-2 py-2 text-right whitespace-nowrap">{formatAccuracy(r.stats.accuracy)}</td>
          <td className="num px-2 py-2 text-right whitespace-nowrap">{r.stats.missCount}</td>
        </tr>
      ))}
    </TableFrame>
  );
}
