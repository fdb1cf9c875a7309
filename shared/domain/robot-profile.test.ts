import { describe, expect, it } from 'vitest';
import { DEFAULT_ROBOT_PROFILE, scoringDepthM } from './robot-profile';

describe('scoringDepthM', () => {
  // Worked by hand: a 28 in (0.7112 m) frame, 3 in (0.0762 m) bumpers, 5 cm standoff → 0.3556 + 0.0762 + 0.05.
  it('adds half the frame length, the bumper and the standoff for a front scorer', () => {
    expect(scoringDepthM(DEFAULT_ROBOT_PROFILE)).toBeCloseTo(0.4818, 6);
  });

  it('uses half the frame width for a side scorer', () => {
    const side = { ...DEFAULT_ROBOT_PROFILE, frameLengthM: 0.9, frameWidthM: 0.6, scoringSide: 'left' as const };
    expect(scoringDepthM(side)).toBeCloseTo(0.3 + 0.0762 + 0.05, 6);
    expect(scoringDepthM({ ...side, scoringSide: 'back' })).toBeCloseTo(0.45 + 0.0762 + 0.05, 6);
  });
});
