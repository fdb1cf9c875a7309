import { Link, useNavigate } from 'react-router-dom';
import type { CycleReview } from '../../../../shared/schemas/cycle';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { QueryError } from '../../../components/ui/query-error';
import { Section } from '../../../components/ui/section';
import { TableFrame } from '../../../components/ui/table-frame';
import { formatDate, formatDateTime } from '../../../lib/format-time';
import { useCycleReview } from '../api/cycles';
import { formatSeconds, matchShort } from '../model/cycles-view';
import { activeReviewFilters, EMPTY_REVIEW, type ReviewView } from '../model/review-query';
import { BreakdownTable } from './breakdown-table';
import { ReviewFilters } from './review-filters';
import { SlowestTable } from './slowest-table';
import { StatTile } from './stat-tile';
import { TrendChart } from './trend-chart';

type CycleReviewPageProps = { view: ReviewView; onChange: (view: ReviewView) => void };

/** The coach review across recordings: filters in the address, the trend per match, breakdowns and the slowest cycles. */
export function CycleReviewPage({ view, onChange }: CycleReviewPageProps) {
  const review = useCycleReview(view);
  const options = review.data?.options ?? { events: [], operators: [] };
  return (
    <div className="flex flex-col gap-5">
      <Section title="Filters" className="p-4">
        <ReviewFilters view={view} options={options} onChange={onChange} />
      </Section>
      {review.isPending ? (
        <Loading label="Reading the cycles…" />
      ) : review.isError ? (
        <QueryError title="Couldn’t load the review" error={review.error} onRetry={() => review.refetch()} isRetrying={review.isFetching} />
      ) : review.data.recordingCount === 0 ? (
        activeReviewFilters(view) > 0 ? (
          <EmptyState icon="cycles" title="No recording matches these filters" action={<Button onClick={() => onChange(EMPTY_REVIEW)}>Clear filters</Button>}>
            Try another event, a wider date range, or any kind and operator.
          </EmptyState>
        ) : (
          <EmptyState icon="cycles" title="No cycles to review yet">
            Cycles are worked out when a recording is finished: play a match with the robot or the simulator, or upload a recording.
          </EmptyState>
        )
      ) : (
        <div className={review.isPlaceholderData ? 'flex flex-col gap-5 opacity-60 transition-opacity' : 'flex flex-col gap-5'} aria-busy={review.isFetching}>
          <ReviewBody review={review.data} />
        </div>
      )}
    </div>
  );
}

function ReviewBody({ review }: { review: CycleReview }) {
  const navigate = useNavigate();
  const openMatch = (i: number) => {
    const match = review.matches[i];
    if (match) navigate(`/recordings/${encodeURIComponent(match.recordingId)}`);
  };
  return (
    <>
      <div className="grid grid-cols-2 gap-3 md:grid-cols-4">
        <StatTile label="Matches" value={review.recordingCount} />
        <StatTile label="Cycles" value={review.cycleCount} detail={`${review.cycleTime.count} place attempts`} />
        <StatTile label="Median cycle" value={formatSeconds(review.cycleTime.medianS)} />
        <StatTile label="p90 cycle" value={formatSeconds(review.cycleTime.p90S)} detail="9 in 10 were this fast or faster" />
      </div>
      <Section
        title="Cycle time per match"
        description="Median and p90 over each match’s place attempts, oldest match first. Click a match in the chart to open its replay."
        className="p-4"
      >
        <TrendChart matches={review.matches} onPick={openMatch} />
        <div className="mt-4">
          <TableFrame
            caption="Cycle time per match"
            isDense
            columns={[
              { label: 'Match' },
              { label: 'Started' },
              { label: 'Operator' },
              { label: 'Cycles', isEnd: true },
              { label: 'Median', isEnd: true },
              { label: 'p90', isEnd: true },
              { label: 'Points', isEnd: true },
              { label: 'Replay', isLabelHidden: true },
            ]}
          >
            {review.matches.map((m) => (
              <tr key={m.recordingId}>
                <th scope="row" className="px-2 py-1.5 font-semibold text-asphalt-100">
                  {matchShort(m) ?? '—'}
                </th>
                <td className="px-2 py-1.5 whitespace-nowrap text-asphalt-300">{formatDateTime(m.startedAt)}</td>
                <td className="px-2 py-1.5 text-asphalt-300">{m.operatorName ?? '—'}</td>
                <td className="num px-2 py-1.5 text-right">{m.cycleCount}</td>
                <td className="num px-2 py-1.5 text-right font-semibold">{formatSeconds(m.cycleTime.medianS)}</td>
                <td className="num px-2 py-1.5 text-right text-asphalt-300">{formatSeconds(m.cycleTime.p90S)}</td>
                <td className="num px-2 py-1.5 text-right">{m.points}</td>
                <td className="px-2 py-1.5 text-right">
                  <Link
                    to={`/recordings/${encodeURIComponent(m.recordingId)}`}
                    className="inline-flex min-h-11 items-center rounded-md px-2 font-semibold text-signal-300 underline-offset-2 hover:underline focus-visible:outline-2 focus-visible:outline-signal-400"
                  >
                    Replay
                  </Link>
                </td>
              </tr>
            ))}
          </TableFrame>
        </div>
      </Section>
      <Section title="Slowest cycles" description="The slowest place attempts; each opens the replay at the cycle’s start." className="p-4">
        <SlowestTable cycles={review.slowest} formatDate={formatDate} />
      </Section>
      <Section title="Breakdowns" description="Coral cycles by level and face; every cycle by station and operator. The bar is the median, the tick the p90." className="p-4">
        <div className="grid gap-6 xl:grid-cols-2">
          <BreakdownTable title="By level" kind="level" groups={review.byLevel} />
          <BreakdownTable title="By face" kind="face" groups={review.byFace} />
          <BreakdownTable title="By station" kind="station" groups={review.byStation} />
          <BreakdownTable title="By operator" kind="operator" groups={review.byOperator} />
        </div>
      </Section>
    </>
  );
}
