import { Link } from 'react-router-dom';
import { callText } from '../../../../shared/domain/drills/drill-calls';
import { runStats, type ScoredCall } from '../../../../shared/domain/drills/drill-scoring';
import type { SubmittedDrillResult } from '../../../../shared/schemas/drill';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { Spinner } from '../../../components/ui/spinner';
import { formatAccuracy, formatReaction } from '../model/format';

type RunResultsProps = {
  scored: ScoredCall[];
  count: number;
  isStopped: boolean;
  /** The stored result (the server's scoring), once saved. */
  saved: SubmittedDrillResult | null;
  isSaving: boolean;
  saveError: Error | null;
  onRetrySave: () => void;
  onAgain?: () => void;
  againHint?: string;
  backHref: string;
};

/** The run's figures, each call's time, and whether the result is stored. */
export function RunResults({ scored, count, isStopped, saved, isSaving, saveError, onRetrySave, onAgain, againHint, backHref }: RunResultsProps) {
  const stats = saved?.stats ?? runStats(scored);
  const calls = saved?.calls ?? scored;
  const bests = saved?.newBests;
  const figures = [
    { label: 'Median', value: formatReaction(stats.medianMs) },
    { label: 'p90', value: formatReaction(stats.p90Ms) },
    { label: 'Fastest', value: formatReaction(stats.fastestMs) },
    { label: 'Accuracy', value: formatAccuracy(stats.accuracy) },
    { label: 'Misses', value: String(stats.missCount) },
    { label: 'Wrong taps', value: String(stats.errorCount) },
  ];
  return (
    <section aria-label="Result" className="mx-auto flex min-h-0 w-full max-w-4xl flex-1 flex-col gap-4 overflow-y-auto">
      <div className="flex flex-wrap items-center gap-3">
        <h2 className="text-2xl font-semibold">{isStopped ? `Stopped after ${calls.length} of ${count} calls` : 'Drill complete'}</h2>
        {bests?.median && <Badge tone="go">New best median</Badge>}
        {bests?.fastest && <Badge tone="go">New fastest call</Badge>}
        {bests?.accuracy && <Badge tone="go">New best accuracy</Badge>}
      </div>
      <dl className="grid grid-cols-3 gap-2 sm:grid-cols-6">
        {figures.map((f) => (
          <div key={f.label} className="rounded-lg bg-asphalt-900 px-3 py-2 ring-1 ring-asphalt-700">
            <dt className="text-2xs font-semibold tracking-widest text-asphalt-400 uppercase">{f.label}</dt>
            <dd className="font-mono text-xl font-semibold text-asphalt-50">{f.value}</dd>
          </div>
        ))}
      </dl>
      <p aria-live="polite" className="flex min-h-6 items-center gap-2 text-sm">
        {isSaving && (
          <>
            <Spinner className="size-4" /> Saving the result…
          </>
        )}
        {calls.length === 0 && <span className="text-asphalt-400">No call was finished, so there is nothing to save.</span>}
        {saved && (
          <span className="text-go" data-testid="drill-saved">
            Saved to your results{isStopped ? ' (a stopped run does not count for personal bests)' : ''}.
          </span>
        )}
      </p>
      {saveError && (
        <Notice tone="error" title="The result was not saved" action={<Button size="sm" onClick={onRetrySave}>Try again</Button>}>
          {saveError.message}
        </Notice>
      )}
      <div className="overflow-hidden rounded-xl ring-1 ring-asphalt-700">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Each call of the run</caption>
          <thead className="bg-asphalt-850 text-2xs tracking-widest text-asphalt-400 uppercase">
            <tr>
              <th scope="col" className="px-3 py-2">#</th>
              <th scope="col" className="px-3 py-2">Call</th>
              <th scope="col" className="px-3 py-2 text-right">Reaction</th>
              <th scope="col" className="px-3 py-2 text-right">Wrong taps</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-asphalt-800">
            {calls.map((c, i) => (
              <tr key={i} className="bg-asphalt-900">
                <td className="px-3 py-2 font-mono text-asphalt-400">{i + 1}</td>
                <td className="px-3 py-2 font-semibold">{callText(c.call)}</td>
                <td className={`px-3 py-2 text-right font-mono ${c.isMiss ? 'text-stop' : ''}`}>{c.isMiss ? 'missed' : formatReaction(c.reactionMs)}</td>
                <td className="px-3 py-2 text-right font-mono">{c.errors}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="flex flex-wrap items-center gap-3 pb-2">
        {onAgain && (
          <Button variant="primary" onClick={onAgain}>
            Run it again
          </Button>
        )}
        <Link to={backHref} className="inline-flex min-h-11 items-center rounded-lg px-4 font-semibold text-asphalt-100 ring-1 ring-asphalt-600 hover:bg-asphalt-800">
          See results over time
        </Link>
        {againHint && <p className="text-sm text-asphalt-400">{againHint}</p>}
      </div>
    </section>
  );
}
