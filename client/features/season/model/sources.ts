import type { Confidence, SeasonProfile, Source } from '../../../../shared/domain/season/season-profile';

/** One sourced value of the season profile, named for people. */
export type SourceEntry = Source & { path: string; label: string };

export type SourceGroup = Source & { labels: string[] };

const isSourced = (v: unknown): v is Source & { value: unknown } =>
  typeof v === 'object' &&
  v !== null &&
  'value' in v &&
  typeof (v as { source?: unknown }).source === 'string' &&
  typeof (v as { fromMemory?: unknown }).fromMemory === 'boolean';

const sourceOf = ({ source, confidence, fromMemory }: Source): Source => ({ source, confidence, fromMemory });
const sourceKey = (s: Source) => `${s.source}|${s.confidence}|${s.fromMemory}`;

const ALLIANCE_WORDS: Record<string, string> = { blue: 'Blue', red: 'Red' };

/** Labels by path with the alliance or level left out (`reefs.*.centre`); anything else is spelled from its path. */
const LABELS: Record<string, string> = {
  'field.lengthM': 'Field length',
  'field.widthM': 'Field width',
  'field.coordinates': 'Field coordinate system',
  'reefs.*.centre': '{a} reef centre',
  'reefs.*.tagIdsCcw': '{a} reef tag order',
  'reefs.*.centreToFaceM': '{a} reef centre-to-face distance',
  'reef.branchLateralOffsetM': 'Branch spacing along a face',
  'reef.branchLetters': 'Branch letters',
  'reef.levels.*': '{l} height',
  'coralStations.*': '{a} coral stations',
  'processors.*': '{a} processor',
  'barge.centreXM': 'Barge position',
  'barge.sizeM': 'Barge size',
  'barge.cages.*': '{a} cages',
  'startingLines.*': '{a} starting line',
  'driverStations.*': '{a} driver stations',
  robotsPerAlliance: 'Robots per alliance',
  'scoring.leave': 'Leave points',
  'scoring.coral.*': '{l} coral points',
  'scoring.algae.processor': 'Processor algae points',
  'scoring.algae.net': 'Net algae points',
  'scoring.barge.park': 'Park points',
  'scoring.barge.shallow': 'Shallow cage points',
  'scoring.barge.deep': 'Deep cage points',
  'rankingPoints.coral': 'Coral ranking point',
  'rankingPoints.coopertition': 'Coopertition',
  'rankingPoints.auto': 'Auto ranking point',
  'rankingPoints.barge': 'Barge ranking point',
  'rankingPoints.win': 'Ranking points for a win',
  'rankingPoints.tie': 'Ranking points for a tie',
  'phases.autoDurationS': 'Auto length',
  'phases.teleopDurationS': 'Teleop length',
  'phases.endgameDurationS': 'Endgame length',
};

/** "driveMaxSpeedMps" → "drive max speed", for paths without a label. */
const words = (segment: string) =>
  segment
    .replace(/(M|S|Deg|Ccw)$/, '')
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .toLowerCase();

export function labelForPath(path: string): string {
  const parts = path.split('.');
  const alliance = parts.find((p) => p in ALLIANCE_WORDS);
  const level = parts.find((p) => /^L[1-4]$/.test(p));
  const pattern = parts.map((p) => (p === alliance || p === level ? '*' : p)).join('.');
  const template = LABELS[pattern];
  if (template) return template.replace('{a}', alliance ? ALLIANCE_WORDS[alliance]! : '').replace('{l}', level ?? '');
  const text = parts.map(words).join(' ');
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** Every sourced value in the profile, in profile order. The 22 AprilTags become one entry per source. */
export function sourceEntries(season: SeasonProfile): SourceEntry[] {
  const out: SourceEntry[] = [];
  const walk = (node: unknown, path: string[]) => {
    if (isSourced(node)) {
      out.push({ path: path.join('.'), label: labelForPath(path.join('.')), ...sourceOf(node) });
      return;
    }
    if (typeof node !== 'object' || node === null) return;
    for (const [key, child] of Object.entries(node)) walk(child, [...path, key]);
  };
  walk({ ...season, tags: [] }, []);

  const tagCounts = new Map<string, { source: Source; count: number }>();
  for (const tag of season.tags) {
    const source = sourceOf(tag);
    const key = sourceKey(source);
    const seen = tagCounts.get(key);
    if (seen) seen.count += 1;
    else tagCounts.set(key, { source, count: 1 });
  }
  const tags = [...tagCounts.values()].map(({ source, count }) => ({
    path: 'tags',
    label: `${count} AprilTag ${count === 1 ? 'pose' : 'poses'}`,
    ...source,
  }));
  // The tags sit right after the field size, where they are in the profile.
  const afterField = out.findIndex((e) => !e.path.startsWith('field.'));
  out.splice(afterField === -1 ? out.length : afterField, 0, ...tags);
  return out;
}

/** Whether the branch targets (poses and level heights) are computed from this value. */
export function isUsedByTargets(entry: Pick<SourceEntry, 'path'>): boolean {
  return (
    entry.path === 'tags' ||
    entry.path.startsWith('reefs.') ||
    entry.path.startsWith('reef.')
  );
}

/** Entries gathered by source, recalled-from-memory sources first, then by confidence (low first). */
export function groupBySource(entries: readonly SourceEntry[]): SourceGroup[] {
  const groups = new Map<string, SourceGroup>();
  for (const e of entries) {
    const key = sourceKey(e);
    const group = groups.get(key) ?? { ...sourceOf(e), labels: [] };
    group.labels.push(e.label);
    groups.set(key, group);
  }
  const rank: Record<Confidence, number> = { low: 0, med: 1, high: 2 };
  return [...groups.values()].sort(
    (a, b) => Number(b.fromMemory) - Number(a.fromMemory) || rank[a.confidence] - rank[b.confidence],
  );
}
