import { describe, expect, it } from 'vitest';
import { wrapDeg } from '../geometry/pose2d';
import {
  branchScoringPoses,
  coralStationPoses,
  headingFacingDeg,
  poseFacingTag,
  processorPose,
  type RobotScoringProfile,
} from './scoring-pose';
import { tagById } from './reef-faces';
import { season2025 } from './season-2025';

const L = 17.548; // [FL] field length
const W = 8.052; // [FL] field width
const frontHalfMetre: RobotScoringProfile = { depthM: 0.5, scoringSide: 'front' };

describe('headingFacingDeg', () => {
  // A surface whose normal points −x (180°) is faced by heading 0 for the front, 180 for the back,
  // −90 for the left side (left = heading + 90 = 0°) and 90 for the right side (right = heading − 90 = 0°).
  it.each([
    ['front', 0],
    ['back', 180],
    ['left', -90],
    ['right', 90],
  ] as const)('turns the %s side toward a face with normal 180° at heading %d°', (side, headingDeg) => {
    expect(headingFacingDeg(180, side)).toBeCloseTo(headingDeg, 9);
  });
});

describe('poseFacingTag', () => {
  // Worked by hand: tag 12 (0.851154, 0.655320, yaw 54°) [FL]; 0.5 m out along 54°:
  // x = 0.851154 + 0.5 cos 54° = 0.851154 + 0.293893 = 1.145047, y = 0.655320 + 0.5 sin 54° = 0.655320 + 0.404508 = 1.059828.
  it('stands 0.5 m out along the tag normal, front toward the tag', () => {
    const pose = poseFacingTag({ xM: 0.851154, yM: 0.65532, yawDeg: 54 }, 0.5, 0, 'front');
    expect(pose.xM).toBeCloseTo(1.145047, 5);
    expect(pose.yM).toBeCloseTo(1.059828, 5);
    expect(pose.headingDeg).toBeCloseTo(-126, 9);
  });
});

describe('branchScoringPoses', () => {
  // Hand arithmetic from [FL] tag 18 (3.6576, 4.0259, yaw 180°), 0.5 m depth, ±0.1651 m branches (from memory):
  // x = 3.6576 − 0.5 = 3.1576; A (the blue driver's left, +y [WD]) y = 4.1910, B y = 3.8608; front faces +x.
  it.each([
    ['A', 3.1576, 4.191],
    ['B', 3.1576, 3.8608],
  ])('puts the blue robot for branch %s at (%f, %f) heading 0° (lettering from memory)', (letter, xM, yM) => {
    const pose = branchScoringPoses(season2025, 'blue', frontHalfMetre).find((p) => p.branch === letter);
    expect(pose?.xM).toBeCloseTo(xM, 6);
    expect(pose?.yM).toBeCloseTo(yM, 6);
    expect(pose?.headingDeg).toBeCloseTo(0, 9);
    expect(pose?.tagId).toBe(18);
    expect(pose?.faceIndex).toBe(0);
  });

  // Tag 21 (5.321046, 4.0259, yaw 0°) faces the barge; the robot stands at x = 5.821046 facing 180°, and G is the
  // robot's left, heading 180° → left is −y: G y = 3.8608, H y = 4.1910.
  it('puts blue G/H on the barge-side face with the robot facing −x (lettering from memory)', () => {
    const poses = branchScoringPoses(season2025, 'blue', frontHalfMetre);
    const g = poses.find((p) => p.branch === 'G');
    const h = poses.find((p) => p.branch === 'H');
    expect(g).toMatchObject({ tagId: 21, faceIndex: 3 });
    expect(g?.xM).toBeCloseTo(5.821046, 6);
    expect(g?.yM).toBeCloseTo(3.8608, 6);
    expect(h?.yM).toBeCloseTo(4.191, 6);
    expect(wrapDeg(g?.headingDeg ?? 0)).toBeCloseTo(180, 9);
  });

  // Each pose stands exactly depthM out along its face tag's normal (the face plane is the tag plane [FL]), and
  // the two branches of a face are the manual's 1 ft 1 in = 0.3302 m apart along it (from memory).
  it.each(['blue', 'red'] as const)('stands every %s pose exactly the configured depth in front of its face', (alliance) => {
    const depthM = 0.473;
    const poses = branchScoringPoses(season2025, alliance, { depthM, scoringSide: 'right' });
    for (const pose of poses) {
      const tag = tagById(season2025, pose.tagId);
      const normal = { x: Math.cos((tag.yawDeg * Math.PI) / 180), y: Math.sin((tag.yawDeg * Math.PI) / 180) };
      expect((pose.xM - tag.xM) * normal.x + (pose.yM - tag.yM) * normal.y).toBeCloseTo(depthM, 9);
    }
    for (let face = 0; face < 6; face += 1) {
      const [left, right] = poses.filter((p) => p.faceIndex === face);
      expect(Math.hypot(left!.xM - right!.xM, left!.yM - right!.yM)).toBeCloseTo(0.3302, 9);
    }
  });

  it('returns all twelve letters A–L in order for each alliance', () => {
    for (const alliance of ['blue', 'red'] as const) {
      expect(branchScoringPoses(season2025, alliance, frontHalfMetre).map((p) => p.branch).join('')).toBe('ABCDEFGHIJKL');
    }
  });

  // Pythagoras: the pose is (centre-to-face + depth) out and 0.1651 m across, so its distance from the reef centre is
  // √((0.8317 + 0.5)² + 0.1651²) = √(1.773425 + 0.027258) = 1.341895 m (x-axis faces; slanted 0.8309 → 1.341103 m).
  it.each(['blue', 'red'] as const)('keeps every %s pose 1.3411–1.3419 m from the reef centre', (alliance) => {
    const c = season2025.reefs[alliance].centre.value;
    for (const pose of branchScoringPoses(season2025, alliance, frontHalfMetre)) {
      const d = Math.hypot(pose.xM - c.xM, pose.yM - c.yM);
      expect(d).toBeGreaterThan(1.3409);
      expect(d).toBeLessThan(1.3421);
    }
  });

  // FACTS.md symmetry (derived from [FL], 2 mm): red = (L − x, W − y, heading + 180°). The lettering rule is the same
  // for both alliances, so each red branch is the blue branch of the same letter turned about the field centre.
  it.each(['front', 'back', 'left', 'right'] as const)('mirrors blue into red by the field’s 180° symmetry (%s side)', (scoringSide) => {
    const robot = { depthM: 0.42, scoringSide };
    const blue = branchScoringPoses(season2025, 'blue', robot);
    const red = branchScoringPoses(season2025, 'red', robot);
    blue.forEach((b, i) => {
      const r = red[i];
      if (!r) throw new Error('missing red pose');
      expect(r.branch).toBe(b.branch);
      expect(Math.abs(r.xM - (L - b.xM))).toBeLessThan(0.002);
      expect(Math.abs(r.yM - (W - b.yM))).toBeLessThan(0.002);
      expect(wrapDeg(r.headingDeg - b.headingDeg - 180)).toBeCloseTo(0, 9);
    });
  });

  it('turns the scoring side, not the front, toward the face', () => {
    const back = branchScoringPoses(season2025, 'blue', { depthM: 0.5, scoringSide: 'back' })[0];
    const left = branchScoringPoses(season2025, 'blue', { depthM: 0.5, scoringSide: 'left' })[0];
    expect(back?.headingDeg).toBeCloseTo(180, 9);
    expect(left?.headingDeg).toBeCloseTo(-90, 9);
    expect(back?.xM).toBeCloseTo(3.1576, 6);
  });

  // From memory (FACTS.md): L1 18 in, L2 31⅞ in, L3 47⅝ in, L4 72 in.
  it('carries the level heights (from memory) on every pose', () => {
    const pose = branchScoringPoses(season2025, 'red', frontHalfMetre)[5];
    expect(pose?.levelHeightsM.L1).toBeCloseTo(18 * 0.0254, 9);
    expect(pose?.levelHeightsM.L4).toBeCloseTo(72 * 0.0254, 9);
  });
});

describe('coralStationPoses', () => {
  it('stands in front of both blue stations, tags 12 and 13 [FL]', () => {
    const [low, high] = coralStationPoses(season2025, 'blue', frontHalfMetre);
    expect(low).toMatchObject({ tagId: 12, name: 'low-y' });
    expect(low?.xM).toBeCloseTo(1.145047, 5);
    expect(low?.yM).toBeCloseTo(1.059828, 5);
    // Tag 13 is tag 12 reflected in y = 4.026 (yaw 306° = −54°): y = 7.396480 − 0.404508 = 6.991972.
    expect(high?.yM).toBeCloseTo(6.991972, 5);
    expect(high?.headingDeg).toBeCloseTo(126, 9);
  });
});

describe('processorPose', () => {
  // Tag 16 (5.987542, −0.003810, yaw 90°) [FL]: 0.5 m out is y = 0.49619, facing −90° (toward the side wall).
  it('stands 0.5 m in from the blue processor facing the wall', () => {
    const pose = processorPose(season2025, 'blue', frontHalfMetre);
    expect(pose.tagId).toBe(16);
    expect(pose.xM).toBeCloseTo(5.987542, 6);
    expect(pose.yM).toBeCloseTo(0.49619, 6);
    expect(pose.headingDeg).toBeCloseTo(-90, 9);
  });

  it('puts the red processor pose where symmetry puts the blue one, within 2 mm', () => {
    const blue = processorPose(season2025, 'blue', frontHalfMetre);
    const red = processorPose(season2025, 'red', frontHalfMetre);
    expect(Math.abs(red.xM - (L - blue.xM))).toBeLessThan(0.002);
    expect(Math.abs(red.yM - (W - blue.yM))).toBeLessThan(0.002);
  });
});
