import { describe, expect, it } from 'vitest';
import { robotFootprint } from './footprint';

describe('robotFootprint', () => {
  // By hand: a 0.8 m × 0.6 m robot at (2, 1) facing +y (90°): front-left corner is 0.4 m ahead (+y) and 0.3 m left
  // (−x), i.e. (1.7, 1.4); the nose is (2, 1.4).
  it('puts the corners and nose of a robot facing +y where rotation by 90° puts them', () => {
    const f = robotFootprint({ xM: 2, yM: 1, headingDeg: 90 }, 0.8, 0.6);
    const expected = [
      [1.7, 1.4],
      [1.7, 0.6],
      [2.3, 0.6],
      [2.3, 1.4],
    ];
    f.corners.forEach((c, i) => {
      expect(c.xM).toBeCloseTo(expected[i]?.[0] ?? NaN, 12);
      expect(c.yM).toBeCloseTo(expected[i]?.[1] ?? NaN, 12);
    });
    expect(f.noseM.xM).toBeCloseTo(2, 12);
    expect(f.noseM.yM).toBeCloseTo(1.4, 12);
  });

  it('keeps side lengths at any heading', () => {
    const [a, b, c] = robotFootprint({ xM: 5, yM: 3, headingDeg: 37 }, 0.9, 0.7).corners;
    if (!a || !b || !c) throw new Error('missing corner');
    expect(Math.hypot(a.xM - b.xM, a.yM - b.yM)).toBeCloseTo(0.9, 12);
    expect(Math.hypot(b.xM - c.xM, b.yM - c.yM)).toBeCloseTo(0.7, 12);
  });
});
