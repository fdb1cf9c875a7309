import { vec2 } from 'gl-matrix';
import { describe, expect, it } from 'vitest';
import { wrapDeg } from '../../../shared/domain/geometry/pose2d';
import { reefBranches, reefFaces } from '../../../shared/domain/season/reef-faces';
import { reefViewTransform } from '../../../shared/domain/season/reef-view';
import { season2025 } from '../../../shared/domain/season/season-2025';
import { ALLIANCES, DRIVER_STATIONS } from '../../../shared/domain/season/season-profile';
import { reefPickerLayout, ringSectorPath } from './reef-picker-layout';

const SEATS = ALLIANCES.flatMap((alliance) => DRIVER_STATIONS.map((station) => [alliance, station] as const));

describe('reefPickerLayout', () => {
  it.each(SEATS)('gives the %s %i operator twelve sectors that tile the ring, each holding its own branch', (alliance, station) => {
    const layout = reefPickerLayout(season2025, alliance, station, 'operator', 'letters');
    expect(layout.branches.map((b) => b.letter)).toEqual(['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H', 'I', 'J', 'K', 'L']);
    const starts = layout.branches.map((b) => wrapDeg(b.fromDeg)).sort((a, b) => a - b);
    // Twelve 30° sectors whose starts are 30° apart cover the circle once.
    starts.forEach((s, i) => expect(wrapDeg(s - starts[0]! - 30 * i)).toBeCloseTo(0, 6));
    for (const b of layout.branches) {
      expect(b.toDeg - b.fromDeg).toBeCloseTo(30, 9);
      const into = wrapDeg(b.angleDeg - b.fromDeg);
      expect(into).toBeGreaterThan(0);
      expect(into).toBeLessThan(30);
    }
  });

  it.each(SEATS)('puts the face nearest the %s %i operator flat at the bottom', (alliance, station) => {
    const layout = reefPickerLayout(season2025, alliance, station, 'operator', 'relative');
    const near = layout.faces.find((f) => f.isNear)!;
    expect(wrapDeg(near.normalDeg + 90)).toBeCloseTo(0, 6);
    expect(near.label).toBe('near');
  });

  it('turns the reef exactly as reefViewTransform does, checked against gl-matrix rotations', () => {
    const view = reefViewTransform(season2025, 'red', 2, 'near-face');
    const layout = reefPickerLayout(season2025, 'red', 2, 'operator', 'letters');
    const centre = season2025.reefs.red.centre.value;
    // Reference: gl-matrix vec2.rotate (counter-clockwise, radians) about the reef centre; float32, so 6 places.
    for (const [i, b] of reefBranches(season2025, 'red').entries()) {
      const out = vec2.create();
      vec2.rotate(out, [b.xM - centre.xM, b.yM - centre.yM], [0, 0], (view.rotationDeg * Math.PI) / 180);
      expect(layout.branches[i]!.atM.xM).toBeCloseTo(out[0]!, 6);
      expect(layout.branches[i]!.atM.yM).toBeCloseTo(out[1]!, 6);
    }
  });

  it('keeps field orientation unturned: the blue reef face toward the blue wall points to −x', () => {
    const layout = reefPickerLayout(season2025, 'blue', 3, 'field', 'letters');
    const face0 = reefFaces(season2025, 'blue')[0]!;
    expect(layout.faces[0]!.normalDeg).toBeCloseTo(face0.normalDeg, 9);
    expect(Math.abs(wrapDeg(layout.faces[0]!.normalDeg - 180))).toBeLessThan(1);
  });

  it('labels faces in the scheme asked for', () => {
    expect(reefPickerLayout(season2025, 'blue', 2, 'operator', 'clock').faces.find((f) => f.isNear)!.label).toBe("6 o'clock");
    expect(reefPickerLayout(season2025, 'blue', 2, 'operator', 'letters').faces.map((f) => f.label)).toContain('A/B');
  });
});

describe('ringSectorPath', () => {
  it('starts and ends its arcs where gl-matrix puts the rotated radii (screen y down)', () => {
    const path = ringSectorPath(30, 60, 1, 2);
    const numbers = path.match(/-?\d+(\.\d+)?/g)!.map(Number);
    // Reference: gl-matrix vec2.rotate of (r, 0) by the angle, then y flipped for the screen.
    const at = (r: number, deg: number) => {
      const out = vec2.create();
      vec2.rotate(out, [r, 0], [0, 0], (deg * Math.PI) / 180);
      return [out[0]!, -out[1]!];
    };
    const [mx, my] = [numbers[0]!, numbers[1]!];
    expect([mx, my].map((v, i) => v - at(2, 30)[i]!).every((d) => Math.abs(d) < 1e-3)).toBe(true);
    expect(path).toMatch(/^M .* A 2 2 0 0 0 .* L .* A 1 1 0 0 1 .* Z$/);
    const lx = numbers[9]!;
    const ly = numbers[10]!;
    expect(lx).toBeCloseTo(at(1, 60)[0]!, 3);
    expect(ly).toBeCloseTo(at(1, 60)[1]!, 3);
  });
});
