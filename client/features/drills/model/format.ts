// Pure: how drill figures read on screen.
import type { CallPart } from '../../../../shared/domain/drills/drill-calls';

/** 843 → "0.84 s"; null → "—". */
export const formatReaction = (ms: number | null | undefined): string => (ms === null || ms === undefined ? '—' : `${(ms / 1000).toFixed(2)} s`);

/** 0.8333 → "83 %". */
export const formatAccuracy = (fraction: number): string => `${Math.round(fraction * 100)} %`;

const PART_WORDS: Record<CallPart, string> = { branch: 'branch', level: 'level', station: 'station' };

/** ["level", "branch"] → "Tap level and branch". */
export function tapPrompt(parts: readonly CallPart[]): string {
  if (parts.length === 0) return '';
  const words = parts.map((p) => PART_WORDS[p]);
  return `Tap ${words.length > 1 ? `${words.slice(0, -1).join(', ')} and ${words.at(-1)}` : words[0]}`;
}
