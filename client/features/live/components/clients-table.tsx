import { Badge } from '../../../components/ui/badge';
import { TableFrame } from '../../../components/ui/table-frame';
import type { SysClient } from '../../../lib/relay-client';
import { formatAge, formatMs, RELAY_ROLE_LABELS } from '../model/live-view';

const KIND_LABELS: Record<SysClient['kind'], string> = { panel: 'Panel', viewer: 'Viewer', robot: 'Robot', recorder: 'Recorder' };
const COLUMNS = [{ label: 'Name' }, { label: 'Role' }, { label: 'Round trip', isEnd: true }, { label: 'Connected', isEnd: true }];

type ClientsTableProps = { clients: readonly SysClient[]; ownSessionId: string | undefined; ownRttMs: number | null | undefined; relayNowMs: number };

/** Everyone on the team's relay now: panels, viewers, robots. */
export function ClientsTable({ clients, ownSessionId, ownRttMs, relayNowMs }: ClientsTableProps) {
  const sorted = [...clients].sort((a, b) => (a.kind === 'robot' ? 0 : 1) - (b.kind === 'robot' ? 0 : 1) || a.connectedAtMs - b.connectedAtMs);
  return (
    <TableFrame caption="Clients connected to the relay" columns={COLUMNS} isDense>
      {sorted.map((c) => (
        <tr key={c.sessionId}>
          <td className="px-2 py-2">
            <span className="flex items-center gap-2 font-semibold whitespace-nowrap text-asphalt-100">
              {c.principal}
              {c.sessionId === ownSessionId && <Badge tone="signal">this tab</Badge>}
            </span>
            <span className="block text-sm whitespace-nowrap text-asphalt-400">
              {KIND_LABELS[c.kind]} · {c.name}
            </span>
          </td>
          <td className="px-2 py-2">
            {c.kind === 'robot' ? <Badge tone="go">Robot</Badge> : <span className="text-asphalt-200">{RELAY_ROLE_LABELS[c.role]}</span>}
          </td>
          <td className="num px-2 py-2 text-right text-asphalt-200">{formatMs(c.sessionId === ownSessionId ? (ownRttMs ?? c.rttMs) : c.rttMs)}</td>
          <td className="num px-2 py-2 text-right text-asphalt-300">{formatAge(relayNowMs - c.connectedAtMs)}</td>
        </tr>
      ))}
    </TableFrame>
  );
}
