import type { Signal } from '../../../../shared/protocol/messages';
import { valueAt, type Series } from '../../../../shared/domain/timeline';
import { useReplay } from '../hooks/use-replay';
import { formatSignalValue } from '../model/replay-view';

type ValuesTableProps = { rows: { signal: Signal; series: Series | undefined; isFixed: boolean }[] };

/** Every shown signal's value at the cursor, as a table. */
export function ValuesTable({ rows }: ValuesTableProps) {
  const tS = useReplay((s) => s.tS);
  return (
    <table className="w-full text-sm">
      <caption className="sr-only">Values at the cursor</caption>
      <thead>
        <tr className="text-left text-2xs tracking-widest text-asphalt-500 uppercase">
          <th scope="col" className="pb-1.5 font-semibold">Signal</th>
          <th scope="col" className="pb-1.5 text-right font-semibold">Value</th>
        </tr>
      </thead>
      <tbody className="divide-y divide-asphalt-750">
        {rows.map(({ signal, series, isFixed }) => (
          <tr key={signal.name} className={isFixed ? undefined : 'bg-asphalt-800/40'}>
            <th scope="row" className="py-1 pr-2 text-left font-normal">
              <code className="text-xs text-asphalt-300">{signal.name}</code>
            </th>
            <td className="num py-1 text-right text-asphalt-100">{series ? formatSignalValue(signal, valueAt(series, tS)) : '…'}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
