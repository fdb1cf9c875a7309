import type { RelayEventEntry } from '../../../lib/relay-client';
import { formatAge, formatValue } from '../model/live-view';

/** The robot's newest events, newest first. */
export function EventsList({ events, relayNowMs }: { events: readonly RelayEventEntry[]; relayNowMs: number }) {
  if (events.length === 0) return <p className="text-[0.9375rem] text-asphalt-400">No events from the robot yet.</p>;
  return (
    <ol aria-label="Recent robot events" className="flex max-h-80 flex-col divide-y divide-asphalt-750 overflow-y-auto">
      {events.map((e) => (
        <li key={e.key} className="flex items-baseline gap-3 py-1.5">
          <span className="num w-16 shrink-0 text-right text-sm text-asphalt-400">{formatAge(relayNowMs - e.tMs)}</span>
          <span className="min-w-0">
            <span className="font-semibold text-asphalt-100">{e.kind.replace(/_/g, ' ')}</span>
            {e.data && (
              <span className="ml-2 text-sm text-asphalt-400">
                {Object.entries(e.data)
                  .map(([k, v]) => `${k} ${formatValue(v, 20)}`)
                  .join(' · ')}
              </span>
            )}
          </span>
        </li>
      ))}
    </ol>
  );
}
