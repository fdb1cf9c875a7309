import { describe, expect, it } from 'vitest';
import { distanceToSegmentM, legStateAt, planLeg, pointAlong, polyline, routeAroundCircle } from './motion';

const LIMITS = { maxSpeedMps: 4.5, maxAccelMps2: 6 };

// Worked examples, constant-acceleration kinematics (v = a·t, s = v²/2a).
describe('planLeg', () => {
  it('from rest over 4 m at 4.5 m/s and 6 m/s² ramps 0.75 s, cruises 0.1389 s and takes 1.6389 s', () => {
    // t_ramp = 4.5/6 = 0.75 s; s_ramp = 4.5²/12 = 1.6875 m; cruise = (4 − 2·1.6875)/4.5 = 0.13889 s.
    const leg = planLeg(4, 0, LIMITS);
    expect(leg.durationS).toBeCloseTo(1.638889, 5);
    expect(legStateAt(leg, 0.75).positionM).toBeCloseTo(1.6875, 6);
    // Symmetric profile: half the time is half the distance, at top speed.
    expect(legStateAt(leg, 1.638889 / 2).positionM).toBeCloseTo(2, 5);
    expect(legStateAt(leg, 1.638889 / 2).velocityMps).toBeCloseTo(4.5, 6);
    expect(legStateAt(leg, 5).positionM).toBe(4);
  });

  it('over 1 m is triangular with a peak of √(a·d) = 2.4495 m/s after √(d/a) = 0.4082 s', () => {
    const leg = planLeg(1, 0, LIMITS);
    expect(leg.profile.isTriangular).toBe(true);
    expect(leg.durationS).toBeCloseTo(0.816497, 5);
    expect(legStateAt(leg, 0.408248).velocityMps).toBeCloseTo(2.44949, 4);
    expect(legStateAt(leg, 0.408248).positionM).toBeCloseTo(0.5, 5);
  });

  it('starting at 3 m/s over 4 m speeds up 0.25 s, cruises 0.3056 s and brakes 0.75 s', () => {
    // 3 → 4.5 m/s: 0.25 s over (4.5² − 3²)/12 = 0.9375 m; braking 0.75 s over 1.6875 m; cruise 1.375/4.5 s.
    const leg = planLeg(4, 3, LIMITS);
    expect(leg.durationS).toBeCloseTo(1.305556, 5);
    expect(legStateAt(leg, 0).positionM).toBeCloseTo(0, 9);
    expect(legStateAt(leg, 0).velocityMps).toBeCloseTo(3, 9);
    expect(legStateAt(leg, 0.25).positionM).toBeCloseTo(0.9375, 6);
    expect(legStateAt(leg, leg.durationS).positionM).toBeCloseTo(4, 9);
  });

  it('brakes harder than the limit when the start speed cannot be shed in the distance', () => {
    // 3 m/s over 0.5 m: uniform braking at 3²/(2·0.5) = 9 m/s² takes 2d/v = 0.3333 s.
    const leg = planLeg(0.5, 3, LIMITS);
    expect(leg.durationS).toBeCloseTo(0.333333, 5);
    expect(legStateAt(leg, leg.durationS).positionM).toBeCloseTo(0.5, 9);
  });

  it('drops a start speed away from the target and moves backwards for a negative distance', () => {
    expect(planLeg(4, -2, LIMITS).durationS).toBeCloseTo(planLeg(4, 0, LIMITS).durationS, 9);
    const back = planLeg(-4, -3, LIMITS);
    expect(back.durationS).toBeCloseTo(1.305556, 5);
    expect(legStateAt(back, 0).velocityMps).toBeCloseTo(-3, 9);
  });
});

describe('pointAlong', () => {
  it('walks an L-shaped line and reports the direction of the segment it is on', () => {
    const line = polyline([
      { xM: 0, yM: 0 },
      { xM: 3, yM: 0 },
      { xM: 3, yM: 4 },
    ]);
    expect(line.lengthM).toBe(7);
    expect(pointAlong(line, 1.5).point).toEqual({ xM: 1.5, yM: 0 });
    expect(pointAlong(line, 5).point).toEqual({ xM: 3, yM: 2 });
    expect(pointAlong(line, 5).direction).toEqual({ xM: 0, yM: 1 });
    expect(pointAlong(line, 99).point).toEqual({ xM: 3, yM: 4 });
  });
});

describe('routeAroundCircle', () => {
  const centre = { xM: 0, yM: 0 };

  it('keeps the straight line when it clears the circle', () => {
    const from = { xM: -3, yM: 2 };
    const to = { xM: 3, yM: 2 };
    expect(routeAroundCircle(from, to, centre, 1)).toEqual([from, to]);
  });

  it('goes around a circle that blocks the line, every leg at least the radius from the centre', () => {
    const route = routeAroundCircle({ xM: -2, yM: 0.01 }, { xM: 2, yM: 0 }, centre, 1);
    expect(route.length).toBeGreaterThan(2);
    for (let i = 1; i < route.length; i += 1) {
      expect(distanceToSegmentM(centre, route[i - 1]!, route[i]!)).toBeGreaterThanOrEqual(1 - 1e-9);
    }
  });

  it('steps straight out first when the start is inside the circle', () => {
    const route = routeAroundCircle({ xM: 0.9, yM: 0 }, { xM: -3, yM: 0.2 }, centre, 1);
    expect(route[1]!.xM).toBeCloseTo(1.15, 9);
    expect(route[1]!.yM).toBeCloseTo(0, 9);
  });
});
