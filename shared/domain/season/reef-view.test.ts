import { describe, expect, it } from 'vitest';
import { driverStationPosition, nearFaceIndex, reefViewTransform, viewAngleDeg } from './reef-view';
import { season2025 } from './season-2025';

const STATIONS = [1, 2, 3] as const;

describe('driverStationPosition', () => {
  it('puts blue stations on the wall at x = 0 and red ones at x = 17.548 [FL field length]', () => {
    expect(driverStationPosition(season2025, 'blue', 2)).toEqual({ xM: 0, yM: 4.026 });
    expect(driverStationPosition(season2025, 'red', 3).xM).toBe(17.548);
  });
});

describe('nearFaceIndex', () => {
  // Driver stations sit on the alliance wall within about ±1.8 m of the centre line (positions from memory), which is
  // at most atan(1.83 / 4.49) ≈ 22° off the reef's wall-face normal, under the 30° that would make a slanted face nearer.
  it.each(STATIONS)('picks the face toward the own wall from blue and red station %d', (station) => {
    expect(nearFaceIndex(season2025, 'blue', station)).toBe(0);
    expect(nearFaceIndex(season2025, 'red', station)).toBe(0);
  });

  it('picks the slanted face when a station is moved far along the wall', () => {
    const moved = structuredClone(season2025);
    moved.driverStations.blue.value = [
      { station: 1, xM: 0, yM: 8.0 },
      { station: 2, xM: 0, yM: 4.026 },
      { station: 3, xM: 0, yM: 0.05 },
    ];
    // From (4.489, 4.026) toward (0, 8.0) is 180° − atan(3.974 / 4.489) ≈ 138.5°, nearest tag 19's normal (120°).
    expect(nearFaceIndex(moved, 'blue', 1)).toBe(5);
    expect(nearFaceIndex(moved, 'blue', 3)).toBe(1);
  });
});

describe('reefViewTransform', () => {
  // A blue operator looks along +x with +y on their left [WD]; "away" must come out as view-up and "left" as view-left.
  it('shows the blue reef with +x up and +y to the left', () => {
    const view = reefViewTransform(season2025, 'blue', 2);
    expect(view.rotationDeg).toBeCloseTo(90, 9);
    const c = view.centre;
    const ahead = view.toView({ xM: c.xM + 1, yM: c.yM });
    const left = view.toView({ xM: c.xM, yM: c.yM + 1 });
    expect(ahead.xM).toBeCloseTo(0, 9);
    expect(ahead.yM).toBeCloseTo(1, 9);
    expect(left.xM).toBeCloseTo(-1, 9);
    expect(left.yM).toBeCloseTo(0, 9);
  });

  // A red operator looks along −x with −y on their left (the field's 180° symmetry).
  it('shows the red reef with −x up and −y to the left', () => {
    const view = reefViewTransform(season2025, 'red', 1);
    expect(Math.abs(view.rotationDeg)).toBeCloseTo(90, 9);
    const c = view.centre;
    const ahead = view.toView({ xM: c.xM - 1, yM: c.yM });
    const left = view.toView({ xM: c.xM, yM: c.yM - 1 });
    expect(ahead.yM).toBeCloseTo(1, 9);
    expect(left.xM).toBeCloseTo(-1, 9);
  });

  // Centre-to-face 0.8317 m [FL derived]: the wall-facing tag sits straight below the centre.
  it.each([
    ['blue', 18],
    ['red', 7],
  ] as const)('puts the %s wall-facing tag %d at the bottom, 0.8317 m below the centre', (alliance, tagId) => {
    const view = reefViewTransform(season2025, alliance, 3);
    const t = season2025.tags.find((s) => s.value.id === tagId)?.value;
    if (!t) throw new Error('missing tag');
    const p = view.toView(t);
    expect(p.xM).toBeCloseTo(0, 6);
    expect(Math.abs(p.yM + 0.8317)).toBeLessThan(0.00025);
    expect(viewAngleDeg(view, t.yawDeg)).toBeCloseTo(-90, 9);
  });

  it.each(STATIONS)('in sightline mode puts blue station %d straight below the reef centre', (station) => {
    const view = reefViewTransform(season2025, 'blue', station, 'sightline');
    const p = view.toView(driverStationPosition(season2025, 'blue', station));
    expect(p.xM).toBeCloseTo(0, 9);
    expect(p.yM).toBeLessThan(0);
  });

  it('tilts the sightline view for an off-centre station by atan(offset / distance)', () => {
    const station = driverStationPosition(season2025, 'blue', 1);
    const c = season2025.reefs.blue.centre.value;
    const expectedDeg = 90 - (Math.atan2(c.yM - station.yM, c.xM - station.xM) * 180) / Math.PI;
    expect(reefViewTransform(season2025, 'blue', 1, 'sightline').rotationDeg).toBeCloseTo(expectedDeg, 9);
  });

  it('maps back to the field with toField', () => {
    const view = reefViewTransform(season2025, 'red', 3, 'sightline');
    const field = { xM: 12.1, yM: 5.3 };
    const back = view.toField(view.toView(field));
    expect(back.xM).toBeCloseTo(field.xM, 9);
    expect(back.yM).toBeCloseTo(field.yM, 9);
  });
});
