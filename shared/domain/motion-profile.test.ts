import { describe, expect, it } from 'vitest';
import { motionDurationS, motionStateAt, planMotionProfile } from './motion-profile';

const limits = { maxSpeedMps: 3, maxAccelMps2: 2 };

describe('planMotionProfile', () => {
  // Worked example, constant-acceleration kinematics (v = a t, d = v²/2a):
  // v = 3 m/s, a = 2 m/s² → ramp 1.5 s over 9/4 = 2.25 m each end; 10 m leaves 5.5 m at 3 m/s = 11/6 s;
  // total 1.5 + 11/6 + 1.5 = 29/6 s.
  it('cruises at top speed when the distance allows: 10 m takes 29/6 s', () => {
    const p = planMotionProfile(10, limits);
    expect(p.isTriangular).toBe(false);
    expect(p.peakSpeedMps).toBeCloseTo(3, 12);
    expect(p.accelDurationS).toBeCloseTo(1.5, 12);
    expect(p.cruiseDurationS).toBeCloseTo(11 / 6, 12);
    expect(p.durationS).toBeCloseTo(29 / 6, 12);
  });

  // Worked example, constant-acceleration kinematics: triangular peak from v² = 2 a (d/2):
  // d = 2 m, a = 2 m/s² → v² = 2·2·1 = 4, v = 2 m/s (< 3), ramp 1 s, total 2 s.
  it('peaks below top speed for a short move: 2 m peaks at 2 m/s and takes 2 s', () => {
    const p = planMotionProfile(2, limits);
    expect(p.isTriangular).toBe(true);
    expect(p.peakSpeedMps).toBeCloseTo(2, 12);
    expect(p.cruiseDurationS).toBe(0);
    expect(p.durationS).toBeCloseTo(2, 12);
  });

  // Worked example: exactly 2·v²/2a = 4.5 m just reaches 3 m/s with no cruise, 1.5 + 1.5 = 3 s.
  it('treats the boundary distance 4.5 m as reaching top speed with no cruise', () => {
    const p = planMotionProfile(4.5, limits);
    expect(p.peakSpeedMps).toBeCloseTo(3, 12);
    expect(p.cruiseDurationS).toBeCloseTo(0, 12);
    expect(p.durationS).toBeCloseTo(3, 12);
  });

  it('takes no time for zero distance', () => {
    const p = planMotionProfile(0, limits);
    expect(p.durationS).toBe(0);
    expect(p.peakSpeedMps).toBe(0);
  });

  it('takes as long backwards as forwards', () => {
    expect(planMotionProfile(-10, limits).durationS).toBeCloseTo(29 / 6, 12);
  });

  it.each([
    [{ maxSpeedMps: 0, maxAccelMps2: 2 }],
    [{ maxSpeedMps: 3, maxAccelMps2: -1 }],
    [{ maxSpeedMps: Number.NaN, maxAccelMps2: 2 }],
    [{ maxSpeedMps: Number.POSITIVE_INFINITY, maxAccelMps2: 2 }],
  ])('rejects limits %o', (bad) => {
    expect(() => planMotionProfile(1, bad)).toThrow(RangeError);
  });
});

describe('motionDurationS', () => {
  // Worked example, constant-acceleration kinematics: d = ½ a t² each half, so 1 m at 2 m/s² with a 3 m/s cap
  // is triangular: ½ m per half → t = √(2·0.5/2) = √0.5 s per half, total 2√0.5 ≈ 1.414 s.
  it('is 2√0.5 s for a 1 m triangular move at 2 m/s²', () => {
    expect(motionDurationS(1, limits)).toBeCloseTo(2 * Math.sqrt(0.5), 12);
  });
});

describe('motionStateAt', () => {
  const trapezoid = planMotionProfile(10, limits);

  // Hand values from d = ½ a t², v = a t, then d = 2.25 + v (t − 1.5) while cruising, mirrored at the end.
  it.each([
    [0.5, 0.25, 1],
    [1.5, 2.25, 3],
    [2.5, 5.25, 3],
    [29 / 6 - 0.5, 10 - 0.25, 1],
  ])('at %f s of a 10 m move is at %f m going %f m/s', (tS, positionM, velocityMps) => {
    const s = motionStateAt(trapezoid, tS);
    expect(s.positionM).toBeCloseTo(positionM, 9);
    expect(s.velocityMps).toBeCloseTo(velocityMps, 9);
  });

  it('is at rest at the start before t = 0', () => {
    expect(motionStateAt(trapezoid, -1)).toEqual({ positionM: 0, velocityMps: 0 });
  });

  it('is at rest at the end for t beyond the duration', () => {
    expect(motionStateAt(trapezoid, 100)).toEqual({ positionM: 10, velocityMps: 0 });
  });

  it('moves in the negative direction for a negative distance', () => {
    const s = motionStateAt(planMotionProfile(-10, limits), 0.5);
    expect(s.positionM).toBeCloseTo(-0.25, 9);
    expect(s.velocityMps).toBeCloseTo(-1, 9);
  });

  it('reaches half the distance at half time with peak speed on a triangular move', () => {
    const triangle = planMotionProfile(2, limits);
    const s = motionStateAt(triangle, 1);
    expect(s.positionM).toBeCloseTo(1, 9);
    expect(s.velocityMps).toBeCloseTo(2, 9);
  });

  it('stays at 0 for a zero-distance profile', () => {
    expect(motionStateAt(planMotionProfile(0, limits), 0.3)).toEqual({ positionM: 0, velocityMps: 0 });
  });
});
