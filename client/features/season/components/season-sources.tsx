import type { Confidence, SeasonProfile } from '../../../../shared/domain/season/season-profile';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { groupBySource, isUsedByTargets, sourceEntries, type SourceEntry } from '../model/sources';

const CONFIDENCE: Record<Confidence, { label: string; tone: BadgeTone }> = {
  high: { label: 'High confidence', tone: 'go' },
  med: { label: 'Medium confidence', tone: 'neutral' },
  low: { label: 'Low confidence', tone: 'stop' },
};

function SourceBadges({ confidence, fromMemory }: Pick<SourceEntry, 'confidence' | 'fromMemory'>) {
  return (
    <span className="flex flex-wrap gap-1.5">
      <Badge tone={CONFIDENCE[confidence].tone}>{CONFIDENCE[confidence].label}</Badge>
      {fromMemory && <Badge tone="signal">From memory</Badge>}
    </span>
  );
}

/** Where the season's numbers come from, how sure they are, and which were recalled rather than read. */
export function SeasonSources({ season }: { season: SeasonProfile }) {
  const entries = sourceEntries(season);
  const forTargets = entries.filter(isUsedByTargets);
  const recalled = forTargets.filter((e) => e.fromMemory);
  const others = groupBySource(entries.filter((e) => !isUsedByTargets(e)));

  return (
    <details className="group rounded-xl bg-asphalt-850 ring-1 ring-asphalt-750">
      <summary className="flex min-h-14 cursor-pointer list-none items-center gap-3 rounded-xl px-5 py-3 hover:bg-asphalt-800 [&::-webkit-details-marker]:hidden">
        <svg viewBox="0 0 16 16" aria-hidden="true" className="size-4 shrink-0 text-asphalt-400 transition-transform group-open:rotate-90">
          <path d="m6 3.5 4.5 4.5L6 12.5" fill="none" stroke="currentColor" strokeWidth="1.75" strokeLinecap="round" strokeLinejoin="round" />
        </svg>
        <span className="font-semibold text-asphalt-100">Sources</span>
        <span className="text-sm text-asphalt-400">
          {recalled.length > 0
            ? `${recalled.length} of the ${forTargets.length} values behind these targets are from memory, not checked against a document`
            : `Every value behind these targets comes from a document`}
        </span>
      </summary>
      <div className="flex flex-col gap-6 border-t border-asphalt-750 px-5 py-5">
        <p className="max-w-prose text-[0.9375rem] text-asphalt-300">
          The targets are computed from the reef’s AprilTag poses in the official field layout, which are exact. Where the
          profile says <span className="font-semibold text-signal-300">from memory</span>, the value was recalled while the
          season profile was written, not read from the game manual: check it against the current manual before relying on
          it at an event.
        </p>
        <section aria-labelledby="sources-targets">
          <h3 id="sources-targets" className="mb-2 text-xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">
            Behind these targets
          </h3>
          <ul className="divide-y divide-asphalt-750 rounded-tile ring-1 ring-asphalt-700">
            {forTargets.map((e) => (
              <li key={e.path} className="grid gap-1 px-4 py-2.5 sm:grid-cols-[14rem_minmax(0,1fr)_auto] sm:items-center sm:gap-4">
                <span className="font-semibold text-asphalt-100">{e.label}</span>
                <span className="text-sm text-asphalt-300">{e.source}</span>
                <SourceBadges confidence={e.confidence} fromMemory={e.fromMemory} />
              </li>
            ))}
          </ul>
        </section>
        <section aria-labelledby="sources-rest">
          <h3 id="sources-rest" className="mb-2 text-xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">
            The rest of the {season.name} profile
          </h3>
          <ul className="divide-y divide-asphalt-750 rounded-tile ring-1 ring-asphalt-700">
            {others.map((g) => (
              <li key={`${g.source}-${g.confidence}-${g.fromMemory}`} className="flex flex-col gap-1.5 px-4 py-2.5">
                <span className="flex flex-wrap items-center justify-between gap-2">
                  <span className="text-sm font-semibold text-asphalt-200">{g.source}</span>
                  <SourceBadges confidence={g.confidence} fromMemory={g.fromMemory} />
                </span>
                <span className="text-sm text-asphalt-400">{g.labels.join(' · ')}</span>
              </li>
            ))}
          </ul>
        </section>
      </div>
    </details>
  );
}
