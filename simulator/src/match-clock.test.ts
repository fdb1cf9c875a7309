import { describe, expect, it } from 'vitest';
import { season2025 } from '../../shared/domain/season/season-2025';
import { isEndgameAt, matchModeAt, matchRemainingS } from './match-clock';

// [GM] 4: auto 15 s, teleop 135 s, 150 s in all; endgame the last 20 s (from memory).
describe('matchModeAt', () => {
  it.each([
    [-0.5, 'disabled'],
    [0, 'auto'],
    [14.99, 'auto'],
    [15, 'teleop'],
    [149.99, 'teleop'],
    [150, 'disabled'],
    [200, 'disabled'],
  ] as const)('at %s s is %s', (tS, mode) => {
    expect(matchModeAt(season2025, tS)).toBe(mode);
  });
});

describe('matchRemainingS', () => {
  it('counts down from 150 s to 0 and stays there', () => {
    expect(matchRemainingS(season2025, -3)).toBe(150);
    expect(matchRemainingS(season2025, 20)).toBe(130);
    expect(matchRemainingS(season2025, 170)).toBe(0);
  });
});

describe('isEndgameAt', () => {
  it('is true from 130 s until the end of teleop only', () => {
    expect(isEndgameAt(season2025, 129.9)).toBe(false);
    expect(isEndgameAt(season2025, 130)).toBe(true);
    expect(isEndgameAt(season2025, 149.9)).toBe(true);
    expect(isEndgameAt(season2025, 150)).toBe(false);
  });
});
