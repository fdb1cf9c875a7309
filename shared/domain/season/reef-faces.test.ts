import { describe, expect, it } from 'vitest';
import { reefBranches, reefFaces, reefOutline, tagById } from './reef-faces';
import { season2025 } from './season-2025';

describe('tagById', () => {
  it('finds tag 18 at (3.6576, 4.0259) facing 180° [FL]', () => {
    expect(tagById(season2025, 18)).toMatchObject({ xM: 3.6576, yM: 4.0259, yawDeg: 180 });
  });

  it('throws for a tag the season lacks', () => {
    expect(() => tagById(season2025, 99)).toThrow(/no AprilTag 99/);
  });
});

describe('reefFaces', () => {
  // Lettering from memory, low confidence (FACTS.md): A/B on the face toward the own wall, then counter-clockwise.
  it.each([
    ['blue', [18, 17, 22, 21, 20, 19]],
    ['red', [7, 8, 9, 10, 11, 6]],
  ] as const)('pairs the %s faces %o with A/B … K/L (lettering from memory)', (alliance, tagIds) => {
    const faces = reefFaces(season2025, alliance);
    expect(faces.map((f) => f.tagId)).toEqual(tagIds);
    expect(faces.map((f) => f.branchLetters.join(''))).toEqual(['AB', 'CD', 'EF', 'GH', 'IJ', 'KL']);
  });
});

describe('reefBranches', () => {
  // Hand arithmetic from [FL] tag 18 (3.6576, 4.0259, yaw 180) and the ±0.1651 m branch offset (from memory):
  // the blue driver's left is +y [WD], so A is at y = 4.0259 + 0.1651 = 4.1910 and B at 3.8608.
  it.each([
    ['A', 3.6576, 4.191],
    ['B', 3.6576, 3.8608],
  ])('puts blue branch %s at (%f, %f) (lettering from memory)', (letter, xM, yM) => {
    const branch = reefBranches(season2025, 'blue').find((b) => b.letter === letter);
    expect(branch?.xM).toBeCloseTo(xM, 6);
    expect(branch?.yM).toBeCloseTo(yM, 6);
  });

  // Tag 7 (13.890498, 4.0259, yaw 0); the red driver faces −x so their left is −y: A at 3.8608, B at 4.1910.
  it('puts red branch A on the red driver’s left, at lower y (lettering from memory)', () => {
    const [a, b] = reefBranches(season2025, 'red');
    expect(a?.letter).toBe('A');
    expect(a?.yM).toBeCloseTo(3.8608, 6);
    expect(b?.yM).toBeCloseTo(4.191, 6);
  });

  it.each(['blue', 'red'] as const)('spaces each %s face’s branch pair 0.3302 m apart (1 ft 1 in, from memory)', (alliance) => {
    const branches = reefBranches(season2025, alliance);
    expect(branches).toHaveLength(12);
    for (let i = 0; i < 12; i += 2) {
      const left = branches[i];
      const right = branches[i + 1];
      if (!left || !right) throw new Error('missing branch');
      expect(Math.hypot(left.xM - right.xM, left.yM - right.yM)).toBeCloseTo(0.3302, 6);
    }
  });
});

describe('reefOutline', () => {
  // A regular hexagon with inradius r has side r · 2 tan 30° = 0.8317 · 1.1547 ≈ 0.9604 m (for the blue reef).
  it('draws a regular hexagon with sides 2 · 0.8317 · tan 30° long', () => {
    const corners = reefOutline(season2025, 'blue');
    expect(corners).toHaveLength(6);
    for (let i = 0; i < 6; i++) {
      const a = corners[i];
      const b = corners[(i + 1) % 6];
      if (!a || !b) throw new Error('missing corner');
      expect(Math.hypot(a.xM - b.xM, a.yM - b.yM)).toBeCloseTo(2 * 0.8317 * Math.tan(Math.PI / 6), 6);
    }
  });

  it('puts each face tag midway between two corners, within 1 mm', () => {
    const corners = reefOutline(season2025, 'blue');
    reefFaces(season2025, 'blue').forEach((face, i) => {
      const a = corners[i];
      const b = corners[(i + 1) % 6];
      if (!a || !b) throw new Error('missing corner');
      expect(Math.hypot((a.xM + b.xM) / 2 - face.xM, (a.yM + b.yM) / 2 - face.yM)).toBeLessThan(0.001);
    });
  });
});
