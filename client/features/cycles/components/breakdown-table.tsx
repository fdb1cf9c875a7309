import type { ReviewGroup } from '../../../../shared/schemas/cycle';
import { TableFrame } from '../../../components/ui/table-frame';
import { barPercent, formatSeconds, groupLabel } from '../model/cycles-view';

type BreakdownTableProps = { title: string; kind: 'level' | 'face' | 'station' | 'operator'; groups: readonly ReviewGroup[] };

/** One breakdown as a table with a bar per group: the median cycle time, with a tick at the p90. */
export function BreakdownTable({ title, kind, groups }: BreakdownTableProps) {
  const maxS = Math.max(0, ...groups.map((g) => g.cycleTime.p90S ?? g.cycleTime.medianS ?? 0));
  return (
    <div className="flex flex-col gap-2" data-breakdown={kind}>
      <h3 className="font-semibold text-asphalt-100">{title}</h3>
      {groups.length === 0 ? (
        <p className="text-sm text-asphalt-400">No cycles to break down.</p>
      ) : (
        <TableFrame
          caption={title}
          isDense
          columns={[
            { label: kind[0]!.toUpperCase() + kind.slice(1) },
            { label: 'Cycles', isEnd: true },
            { label: 'Missed', isEnd: true },
            { label: 'Median', isEnd: true },
            { label: 'p90', isEnd: true },
            { label: 'Median and p90', isLabelHidden: true },
          ]}
        >
          {groups.map((g) => {
            const median = barPercent(g.cycleTime.medianS, maxS);
            const p90 = barPercent(g.cycleTime.p90S, maxS);
            return (
              <tr key={g.key ?? 'none'} className="[&>td]:whitespace-nowrap">
                <th scope="row" className="px-2 py-2 font-medium whitespace-nowrap text-asphalt-200">
                  {groupLabel(kind, g.key)}
                </th>
                <td className="num px-2 py-2 text-right">{g.cycleCount}</td>
                <td className="num px-2 py-2 text-right">{g.missed}</td>
                <td className="num px-2 py-2 text-right font-semibold">{formatSeconds(g.cycleTime.medianS)}</td>
                <td className="num px-2 py-2 text-right text-asphalt-300">{formatSeconds(g.cycleTime.p90S)}</td>
                <td className="w-2/5 min-w-24 px-2 py-2" aria-hidden="true">
                  <div className="relative h-3 rounded-sm bg-asphalt-800">
                    <div className="absolute inset-y-0 left-0 rounded-sm bg-signal-500/80" style={{ width: `${median}%` }} />
                    {g.cycleTime.p90S !== null && <div className="absolute -inset-y-0.5 w-0.5 bg-sky" style={{ left: `calc(${p90}% - 1px)` }} />}
                  </div>
                </td>
              </tr>
            );
          })}
        </TableFrame>
      )}
    </div>
  );
}
