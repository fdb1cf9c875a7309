import { describe, expect, it } from 'vitest';
import { distanceM } from '../../shared/domain/geometry/pose2d';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { APPROACH_M, simTargets } from './field-targets';

const FIELD_MID_Y_M = 4.026;

describe('simTargets', () => {
  it('puts the operator’s left station on the high-y side for blue and the low-y side for red', () => {
    // +y is to the left of a blue driver (season coordinates); a red driver faces the other way.
    expect(simTargets(season2025, DEFAULT_ROBOT_PROFILE, 'blue', 2).stations.left.yM).toBeGreaterThan(FIELD_MID_Y_M);
    expect(simTargets(season2025, DEFAULT_ROBOT_PROFILE, 'red', 2).stations.left.yM).toBeLessThan(FIELD_MID_Y_M);
  });

  it('sets each approach pose APPROACH_M out from its scoring pose, further from the reef centre', () => {
    const t = simTargets(season2025, DEFAULT_ROBOT_PROFILE, 'blue', 2);
    for (const b of Object.values(t.branches)) {
      expect(distanceM(b.approach, b.scoring)).toBeCloseTo(APPROACH_M, 9);
      expect(distanceM(b.approach, t.reefCentre)).toBeGreaterThan(distanceM(b.scoring, t.reefCentre));
      expect(distanceM(b.approach, t.reefCentre)).toBeGreaterThan(t.reefClearanceM);
    }
  });

  it('starts the robot with its bumpers touching the starting line on the barge side', () => {
    const blue = simTargets(season2025, DEFAULT_ROBOT_PROFILE, 'blue', 1);
    const red = simTargets(season2025, DEFAULT_ROBOT_PROFILE, 'red', 3);
    expect(blue.start.xM - blue.startingLineXM).toBeCloseTo(blue.halfLengthM, 9);
    expect(red.startingLineXM - red.start.xM).toBeCloseTo(red.halfLengthM, 9);
  });
});
