import { describe, expect, it } from 'vitest';
import { fieldPlan, lineAcrossField } from './field-plan';
import { season2025 } from './season-2025';

const L = 17.548; // [FL]
const W = 8.052; // [FL]

describe('lineAcrossField', () => {
  // By hand: through tag 12 (0.851154, 0.655320) along 144° (the face direction, yaw 54° + 90°): the line meets
  // x = 0 after 0.851154 / cos 36° = 1.052084 m, at y = 0.655320 + 1.052084 · sin 36° = 1.273720, and y = 0 the other way
  // after 0.655320 / sin 36° = 1.114898 m, at x = 0.851154 + 1.114898 · cos 36° = 1.753125.
  it('cuts the blue low-y corner where the coral station tag line meets the walls', () => {
    const s = lineAcrossField({ xM: 0.851154, yM: 0.65532 }, 144, L, W);
    expect(s.from.xM).toBeCloseTo(1.753125, 4);
    expect(s.from.yM).toBeCloseTo(0, 9);
    expect(s.to.xM).toBeCloseTo(0, 9);
    expect(s.to.yM).toBeCloseTo(1.27372, 4);
  });

  it('spans the whole field for a line along x', () => {
    const s = lineAcrossField({ xM: 3, yM: 2 }, 0, L, W);
    expect(s.from).toEqual({ xM: 0, yM: 2 });
    expect(s.to.xM).toBeCloseTo(L, 12);
  });
});

describe('fieldPlan', () => {
  const plan = fieldPlan(season2025, 0.25);

  it('sets a metre viewBox around the field with y negated', () => {
    expect(plan.viewBox.minX).toBeCloseTo(-0.25, 12);
    expect(plan.viewBox.minY).toBeCloseTo(-(W + 0.25), 12);
    expect(plan.viewBox.width).toBeCloseTo(L + 0.5, 12);
    expect(plan.viewBox.height).toBeCloseTo(W + 0.5, 12);
  });

  it('draws both reefs with twelve lettered branches', () => {
    expect(plan.reefs.map((r) => r.alliance)).toEqual(['blue', 'red']);
    for (const reef of plan.reefs) {
      expect(reef.outline).toHaveLength(6);
      expect(reef.branches.map((b) => b.letter).join('')).toBe('ABCDEFGHIJKL');
    }
  });

  // FACTS.md symmetry (derived from [FL]): the red coral station corners are the blue ones turned 180°, within 2 mm.
  it('draws the coral stations as corner cuts that mirror between alliances', () => {
    const [blueLow, blueHigh, redLow, redHigh] = plan.coralStations;
    if (!blueLow || !blueHigh || !redLow || !redHigh) throw new Error('missing station');
    expect(Math.abs(redHigh.from.xM - (L - blueLow.from.xM))).toBeLessThan(0.002);
    expect(Math.abs(redHigh.from.yM - (W - blueLow.from.yM))).toBeLessThan(0.002);
    expect(Math.abs(redLow.to.yM - (W - blueHigh.to.yM))).toBeLessThan(0.002);
  });

  it('puts the processor marks on the side walls', () => {
    const [blue, red] = plan.processors;
    expect(blue?.from.yM).toBeCloseTo(-0.00381, 9);
    expect(red?.to.yM).toBeCloseTo(8.05561, 9);
  });

  it('centres the barge on the centre line with six cages (positions from memory)', () => {
    const xs = plan.barge.corners.map((c) => c.xM);
    expect((Math.min(...xs) + Math.max(...xs)) / 2).toBeCloseTo(L / 2, 9);
    expect(plan.barge.cages).toHaveLength(6);
  });

  it('draws one starting line per alliance across the field (from memory)', () => {
    expect(plan.startingLines.map((s) => s.alliance)).toEqual(['blue', 'red']);
    expect(plan.startingLines[0]?.from.xM).toBeLessThan(L / 2);
    expect(plan.startingLines[1]?.from.xM).toBeGreaterThan(L / 2);
  });
});
