import { describe, expect, it } from 'vitest';
import {
  angleDiffDeg,
  bearingDeg,
  composePose,
  degToRad,
  distanceM,
  inversePose,
  relativePose,
  transformPoint,
  wrapDeg,
  wrapRad,
  type Pose2d,
} from './pose2d';

const expectPoseClose = (actual: Pose2d, expected: Pose2d) => {
  expect(actual.xM).toBeCloseTo(expected.xM, 9);
  expect(actual.yM).toBeCloseTo(expected.yM, 9);
  expect(wrapDeg(actual.headingDeg - expected.headingDeg)).toBeCloseTo(0, 9);
};

describe('wrapDeg', () => {
  it.each([
    [0, 0],
    [180, 180],
    [-180, 180],
    [190, -170],
    [-190, 170],
    [360, 0],
    [540, 180],
    [-721, -1],
    [300, -60],
  ])('wraps %d° to %d°', (input, expected) => {
    expect(wrapDeg(input)).toBeCloseTo(expected, 9);
  });
});

describe('wrapRad', () => {
  it.each([
    [0, 0],
    [Math.PI, Math.PI],
    [-Math.PI, Math.PI],
    [3 * Math.PI, Math.PI],
    [1.5 * Math.PI, -0.5 * Math.PI],
    [-2.5 * Math.PI, -0.5 * Math.PI],
  ])('wraps %f rad to %f rad', (input, expected) => {
    expect(wrapRad(input)).toBeCloseTo(expected, 9);
  });
});

describe('degToRad', () => {
  it('turns 180° into π', () => {
    expect(degToRad(180)).toBeCloseTo(Math.PI, 12);
  });
});

describe('transformPoint', () => {
  // Worked example, plane rotation: a robot at (1, 2) facing +y (90°) has its "1 m ahead" at (1, 3)
  // and its "1 m to the left" at (0, 2).
  it.each([
    [{ xM: 1, yM: 0 }, { xM: 1, yM: 3 }],
    [{ xM: 0, yM: 1 }, { xM: 0, yM: 2 }],
    [{ xM: -2, yM: 0 }, { xM: 1, yM: 0 }],
  ])('maps local %o to field %o for a robot at (1, 2) facing 90°', (local, field) => {
    const p = transformPoint({ xM: 1, yM: 2, headingDeg: 90 }, local);
    expect(p.xM).toBeCloseTo(field.xM, 12);
    expect(p.yM).toBeCloseTo(field.yM, 12);
  });
});

describe('composePose', () => {
  it('adds a local move after turning: (0,0,90°) then 2 m ahead and a 90° turn gives (0,2,180°)', () => {
    expectPoseClose(composePose({ xM: 0, yM: 0, headingDeg: 90 }, { xM: 2, yM: 0, headingDeg: 90 }), {
      xM: 0,
      yM: 2,
      headingDeg: 180,
    });
  });

  it('is associative', () => {
    const a = { xM: 1, yM: -2, headingDeg: 30 };
    const b = { xM: 0.5, yM: 4, headingDeg: -75 };
    const c = { xM: -3, yM: 1, headingDeg: 200 };
    expectPoseClose(composePose(composePose(a, b), c), composePose(a, composePose(b, c)));
  });
});

describe('inversePose', () => {
  it.each([
    { xM: 3, yM: 4, headingDeg: 0 },
    { xM: -1.2, yM: 7.5, headingDeg: 135 },
    { xM: 16.7, yM: 0.66, headingDeg: -126 },
  ])('composed with %o gives the identity both ways', (p) => {
    const identity = { xM: 0, yM: 0, headingDeg: 0 };
    expectPoseClose(composePose(p, inversePose(p)), identity);
    expectPoseClose(composePose(inversePose(p), p), identity);
  });
});

describe('relativePose', () => {
  it('puts a target 2 m in front of a robot facing −x at local (2, 0, 0°)', () => {
    const robot = { xM: 5, yM: 1, headingDeg: 180 };
    const target = { xM: 3, yM: 1, headingDeg: 180 };
    expectPoseClose(relativePose(robot, target), { xM: 2, yM: 0, headingDeg: 0 });
  });

  it('inverts composePose: relativePose(a, a ∘ b) = b', () => {
    const a = { xM: 2, yM: 3, headingDeg: -40 };
    const b = { xM: -1, yM: 0.25, headingDeg: 170 };
    expectPoseClose(relativePose(a, composePose(a, b)), b);
  });
});

describe('distanceM', () => {
  it('is 5 for a 3-4-5 triangle', () => {
    expect(distanceM({ xM: 1, yM: 1 }, { xM: 4, yM: 5 })).toBeCloseTo(5, 12);
  });
});

describe('bearingDeg', () => {
  it.each([
    [{ xM: 1, yM: 0 }, 0],
    [{ xM: 0, yM: 1 }, 90],
    [{ xM: -1, yM: 0 }, 180],
    [{ xM: 1, yM: -1 }, -45],
  ])('from the origin toward %o is %d°', (to, expected) => {
    expect(bearingDeg({ xM: 0, yM: 0 }, to)).toBeCloseTo(expected, 9);
  });
});

describe('angleDiffDeg', () => {
  it.each([
    [350, 10, 20],
    [10, 350, -20],
    [0, 180, 180],
  ])('turns %d° onto %d° by %d°', (from, to, expected) => {
    expect(angleDiffDeg(from, to)).toBeCloseTo(expected, 9);
  });
});
