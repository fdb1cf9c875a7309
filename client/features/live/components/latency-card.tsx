import type { LatencyStats } from '../../../lib/relay-client';
import { formatMs } from '../model/live-view';

function Figure({ label, ms, isMain = false }: { label: string; ms: number; isMain?: boolean }) {
  return (
    <div>
      <dt className="text-2xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">{label}</dt>
      <dd className={isMain ? 'num text-2xl font-semibold text-asphalt-100' : 'num text-lg font-semibold text-asphalt-200'}>{formatMs(ms)}</dd>
    </div>
  );
}

/** Tap → ack round trips of this tab's own sends. */
export function LatencyCard({ stats }: { stats: LatencyStats | undefined }) {
  if (!stats) return <p className="text-[0.9375rem] text-asphalt-400">No acknowledged taps from this tab yet. Send a target to measure.</p>;
  return (
    <div>
      <dl className="grid grid-cols-3 gap-3">
        <Figure label="p50" ms={stats.p50Ms} isMain />
        <Figure label="p90" ms={stats.p90Ms} isMain />
        <Figure label="p99" ms={stats.p99Ms} isMain />
      </dl>
      <p className="mt-3 text-sm text-asphalt-400">
        Last <span className="num text-asphalt-200">{formatMs(stats.lastMs)}</span> · <span className="num text-asphalt-200">{stats.count}</span>{' '}
        {stats.count === 1 ? 'tap' : 'taps'} acknowledged
        {stats.windowCount < stats.count && <> · percentiles over the last {stats.windowCount}</>}
      </p>
    </div>
  );
}
