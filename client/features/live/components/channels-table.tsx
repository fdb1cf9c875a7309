import { Badge } from '../../../components/ui/badge';
import { TableFrame } from '../../../components/ui/table-frame';
import { formatAge, type ChannelRow } from '../model/live-view';

const COLUMNS = [{ label: 'Channel' }, { label: 'Value' }, { label: 'Set by' }, { label: 'Age', isEnd: true }, { label: 'Robot' }];

/** Every op/ and robot/ channel's current value, who set it, how long ago and whether the robot has it. */
export function ChannelsTable({ rows }: { rows: readonly ChannelRow[] }) {
  return (
    <TableFrame caption="Channels and their current values" columns={COLUMNS} isDense>
      {rows.map((r) => (
        <tr key={r.channel}>
          <td className="px-2 py-2 whitespace-nowrap">
            <code className="text-sm text-signal-300">{r.channel}</code>
          </td>
          <td className="max-w-64 px-2 py-2">
            <code className="block truncate text-sm text-asphalt-100" title={r.value}>
              {r.value}
            </code>
          </td>
          <td className="px-2 py-2 text-sm text-asphalt-300">{r.setBy}</td>
          <td className="num px-2 py-2 text-right text-sm whitespace-nowrap text-asphalt-300">{formatAge(r.ageMs)}</td>
          <td className="px-2 py-2 whitespace-nowrap">
            {r.ack === 'acked' && <Badge tone="go">has it</Badge>}
            {r.ack === 'waiting' && <Badge tone="signal">not acknowledged</Badge>}
            {r.ack === 'none' && <span className="text-sm text-asphalt-500">its own</span>}
          </td>
        </tr>
      ))}
    </TableFrame>
  );
}
