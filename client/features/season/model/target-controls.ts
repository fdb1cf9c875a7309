import { scoringDepthM } from '../../../../shared/domain/robot-profile';
import type { ScoringSide } from '../../../../shared/domain/season/scoring-pose';
import type { Alliance } from '../../../../shared/domain/season/season-profile';
import type { RobotProfile } from '../../../../shared/schemas/robot-profile';
import { targetsQuerySchema, type TargetsQuery } from '../../../../shared/schemas/season';
import { formatMetres, parseDecimal } from '../../../lib/format-number';

/**
 * What the season page's controls hold. `null` means "as the robot profile says". The depth keeps the text
 * as typed and, apart from it, the last value that made sense, so a half-typed number never reaches the server.
 */
export type TargetControls = {
  alliance: Alliance;
  side: ScoringSide | null;
  depthText: string | null;
  depthM: number | null;
};

export type TargetControlsAction =
  | { type: 'alliance'; alliance: Alliance }
  | { type: 'side'; side: ScoringSide }
  | { type: 'depth'; text: string }
  | { type: 'reset' };

export const initialTargetControls = (alliance: Alliance = 'blue'): TargetControls => ({
  alliance,
  side: null,
  depthText: null,
  depthM: null,
});

// The server's own bounds for ?depth=, so the two never disagree.
const depthRule = targetsQuerySchema.shape.depth.unwrap();
const DEPTH_MIN_M = depthRule.minValue ?? 0;
const DEPTH_MAX_M = depthRule.maxValue ?? Number.POSITIVE_INFINITY;

/** Why typed depth text can't be sent, or null when it can. */
export function depthError(text: string): string | null {
  const depthM = parseDecimal(text);
  if (depthM === undefined) return 'Enter a depth in metres, or reset to the robot profile';
  if (Number.isNaN(depthM)) return 'Depth must be a number of metres';
  if (depthM < DEPTH_MIN_M) return 'Depth cannot be negative';
  if (depthM > DEPTH_MAX_M) return `Depth is at most ${DEPTH_MAX_M} m`;
  return null;
}

export function targetControlsReducer(state: TargetControls, action: TargetControlsAction): TargetControls {
  switch (action.type) {
    case 'alliance':
      return { ...state, alliance: action.alliance };
    case 'side':
      return { ...state, side: action.side };
    case 'depth':
      return {
        ...state,
        depthText: action.text,
        depthM: depthError(action.text) === null ? (parseDecimal(action.text) ?? null) : state.depthM,
      };
    case 'reset':
      return initialTargetControls(state.alliance);
  }
}

/** The `/api/season/targets` query: only what is overridden is sent, the server fills the rest from the profile. */
export function targetsQueryFor(state: TargetControls): TargetsQuery {
  return {
    alliance: state.alliance,
    ...(state.side !== null && { side: state.side }),
    ...(state.depthM !== null && { depth: state.depthM }),
  };
}

export type ResolvedControls = {
  side: ScoringSide;
  profileSide: ScoringSide;
  /** What the depth input shows. */
  depthText: string;
  depthError: string | null;
  /** The depth the robot profile gives for the chosen side; the server uses it when depth isn't overridden. */
  profileDepthM: number;
  isSideOverridden: boolean;
  isDepthOverridden: boolean;
};

/** The controls as shown: overrides where there are some, the robot profile elsewhere. */
export function resolveControls(state: TargetControls, profile: RobotProfile): ResolvedControls {
  const side = state.side ?? profile.scoringSide;
  const profileDepthM = scoringDepthM({ ...profile, scoringSide: side });
  return {
    side,
    profileSide: profile.scoringSide,
    depthText: state.depthText ?? formatMetres(profileDepthM),
    depthError: state.depthText === null ? null : depthError(state.depthText),
    profileDepthM,
    isSideOverridden: state.side !== null && state.side !== profile.scoringSide,
    isDepthOverridden: state.depthText !== null,
  };
}
