import type { Alliance } from '../../../../shared/domain/season/season-profile';
import type { MatchType, RecordingMetadata, RecordingSummary } from '../../../../shared/schemas/recording';

export const KIND_LABELS: Record<RecordingSummary['kind'], string> = {
  match: 'Match',
  practice: 'Practice',
  drill: 'Drill',
  simulated: 'Simulated',
};

export const SOURCE_LABELS: Record<RecordingSummary['source'], string> = {
  live: 'Live',
  upload: 'Upload',
  simulator: 'Simulator',
};

export const ALLIANCE_LABELS: Record<Alliance, string> = { blue: 'Blue', red: 'Red' };

export const MATCH_TYPE_LABELS: Record<MatchType, { long: string; short: string }> = {
  practice: { long: 'Practice', short: 'P' },
  qualification: { long: 'Qualification', short: 'Q' },
  playoff: { long: 'Playoff', short: 'PO' },
};

/** Seconds as "m:ss" under an hour, "h:mm:ss" from an hour; tenths under ten seconds ("4.2 s"). */
export function formatDuration(durationS: number): string {
  if (!Number.isFinite(durationS) || durationS < 0) return '—';
  if (durationS < 10) return `${(Math.floor(durationS * 10) / 10).toFixed(1)} s`;
  const total = Math.floor(durationS);
  const h = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const s = String(total % 60).padStart(2, '0');
  return h > 0 ? `${h}:${String(m).padStart(2, '0')}:${s}` : `${m}:${s}`;
}

/** The match as a person says it, long ("Qualification 7") and short ("Q7"); null when nobody said which. */
export function matchLabel(
  metadata: Pick<RecordingMetadata, 'matchType' | 'matchNumber'>,
): { long: string; short: string } | null {
  const { matchType, matchNumber } = metadata;
  if (matchType === null && matchNumber === null) return null;
  if (matchType === null) return { long: `Match ${matchNumber}`, short: `#${matchNumber}` };
  const names = MATCH_TYPE_LABELS[matchType];
  if (matchNumber === null) return { long: names.long, short: names.short };
  return { long: `${names.long} ${matchNumber}`, short: `${names.short}${matchNumber}` };
}

/** "Blue 2", "Red", or null when the alliance isn't known (a station alone says nothing). */
export function stationLabel(metadata: Pick<RecordingMetadata, 'alliance' | 'station'>): string | null {
  if (metadata.alliance === null) return null;
  const name = ALLIANCE_LABELS[metadata.alliance];
  return metadata.station === null ? name : `${name} ${metadata.station}`;
}

/** Bytes for people: "812 B", "14.3 KB", "2.1 MB". */
export function formatBytes(bytes: number): string {
  if (bytes < 1000) return `${bytes} B`;
  if (bytes < 1_000_000) return `${(bytes / 1000).toFixed(1)} KB`;
  return `${(bytes / 1_000_000).toFixed(1)} MB`;
}

/** Whole percent of a transfer, 0–100; 0 when the total isn't known yet. */
export function percentOf(sent: number, total: number): number {
  if (total <= 0) return 0;
  return Math.min(100, Math.max(0, Math.round((sent / total) * 100)));
}
