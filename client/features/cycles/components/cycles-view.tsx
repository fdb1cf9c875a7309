import { useSyncExternalStore } from 'react';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { QueryError } from '../../../components/ui/query-error';
import { useRecordingCycles } from '../api/cycles';
import { cycleIndexAt } from '../model/cycles-view';
import { CyclesTable } from './cycles-table';
import { MatchSummaryPanel } from './match-summary';
import { SegmentChart } from './segment-chart';

/** The replay's timeline as the cycles view uses it: read the cursor, follow it, move it. */
export type CyclesTimeline = {
  now: () => number;
  subscribe: (listener: () => void) => () => void;
  seek: (tS: number) => void;
};

type CyclesViewProps = { recordingId: string; isLive: boolean; timeline: CyclesTimeline };

/** The match summary and the cycles of one recording; picking a cycle moves the replay's cursor to its start. */
export function CyclesView({ recordingId, isLive, timeline }: CyclesViewProps) {
  const query = useRecordingCycles(recordingId, isLive);
  const cycles = query.data?.cycles ?? [];
  const currentIndex = useSyncExternalStore(timeline.subscribe, () => cycleIndexAt(cycles, timeline.now()));

  if (query.isPending) return <Loading label="Working out the cycles…" />;
  if (query.isError) return <QueryError title="Couldn’t load the cycles" error={query.error} onRetry={() => query.refetch()} isRetrying={query.isFetching} />;
  const pick = (i: number) => {
    const c = cycles[i];
    if (c) timeline.seek(c.startS);
  };
  return (
    <div className="flex flex-col gap-5">
      <MatchSummaryPanel summary={query.data.summary} />
      {cycles.length === 0 ? (
        <EmptyState icon="cycles" title="No cycles in this recording">
          A cycle needs a pickup (an <span className="font-mono">acquired</span> event) and a place, miss or drop. This recording has none of them
          {isLive ? ' yet; they appear as the robot plays.' : '.'}
        </EmptyState>
      ) : (
        <>
          <SegmentChart cycles={cycles} currentIndex={currentIndex} onPick={pick} />
          <CyclesTable cycles={cycles} currentIndex={currentIndex} onPick={pick} />
        </>
      )}
    </div>
  );
}
