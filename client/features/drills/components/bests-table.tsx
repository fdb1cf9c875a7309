import type { PersonalBestEntry } from '../../../../shared/schemas/drill';
import { TableFrame } from '../../../components/ui/table-frame';
import { formatDate } from '../../../lib/format-time';
import { formatAccuracy, formatReaction } from '../model/format';

const COLUMNS = [
  { label: 'Operator' },
  { label: 'Drill' },
  { label: 'Runs', isEnd: true },
  { label: 'Best median', isEnd: true },
  { label: 'Fastest call', isEnd: true },
  { label: 'Best accuracy', isEnd: true },
  { label: 'Last run', isEnd: true },
] as const;

/** Personal bests per operator and drill (complete runs only). */
export function BestsTable({ bests }: { bests: readonly PersonalBestEntry[] }) {
  return (
    <TableFrame caption="Personal bests per operator and drill" columns={COLUMNS}>
      {bests.map((b) => (
        <tr key={`${b.operator.id}:${b.drillId ?? b.drillName}`} className="bg-asphalt-900">
          <td className="px-4 py-2.5 font-semibold whitespace-nowrap">{b.operator.name}</td>
          <td className="px-4 py-2.5 text-asphalt-300">{b.drillName}</td>
          <td className="num px-4 py-2.5 text-right whitespace-nowrap">{b.runCount}</td>
          <td className="num px-4 py-2.5 text-right whitespace-nowrap text-signal-300">{formatReaction(b.bestMedianMs)}</td>
          <td className="num px-4 py-2.5 text-right whitespace-nowrap">{formatReaction(b.fastestMs)}</td>
          <td className="num px-4 py-2.5 text-right whitespace-nowrap">{formatAccuracy(b.bestAccuracy)}</td>
          <td className="num px-4 py-2.5 text-right whitespace-nowrap text-asphalt-400">{formatDate(b.lastRunAt)}</td>
        </tr>
      ))}
    </TableFrame>
  );
}
