// Pure: no I/O, clocks or randomness; imports only shared/. Which part of a match a given match time falls in.
import type { SeasonProfile } from '../../shared/domain/season/season-profile';

export const MATCH_MODES = ['disabled', 'auto', 'teleop'] as const;
export type MatchMode = (typeof MATCH_MODES)[number];

/** Auto and teleop end times in seconds of match time (auto starts at 0). */
export function matchEndsS(season: SeasonProfile): { autoEndS: number; teleopEndS: number } {
  const autoEndS = season.phases.autoDurationS.value;
  return { autoEndS, teleopEndS: autoEndS + season.phases.teleopDurationS.value };
}

/** Mode at match time tS: auto in [0, auto end), teleop in [auto end, teleop end), disabled before and after. */
export function matchModeAt(season: SeasonProfile, tS: number): MatchMode {
  const { autoEndS, teleopEndS } = matchEndsS(season);
  if (tS < 0 || tS >= teleopEndS) return 'disabled';
  return tS < autoEndS ? 'auto' : 'teleop';
}

/** Seconds left in the match at tS (0 after the end, the whole match before the start). */
export function matchRemainingS(season: SeasonProfile, tS: number): number {
  const { teleopEndS } = matchEndsS(season);
  return Math.min(teleopEndS, Math.max(0, teleopEndS - tS));
}

/** True in the last endgame seconds of teleop. */
export function isEndgameAt(season: SeasonProfile, tS: number): boolean {
  const { teleopEndS } = matchEndsS(season);
  return matchModeAt(season, tS) === 'teleop' && tS >= teleopEndS - season.phases.endgameDurationS.value;
}
