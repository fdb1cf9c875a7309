import { describe, expect, it } from 'vitest';
import type { Device, Grid, Tile } from '../../schemas/panel';
import { season2025 } from '../season/season-2025';
import { TILE_CATALOGUE } from './tile-catalogue';
import { deviceSize } from './grid';
import { headingHeightPx, largestSquareInRingSector, optionColumns, pickerButtonSize, RUN_STATUS_STRIP_PX, runCanvasSize, tileTouchTargets } from './touch-targets';

const device = (widthPx: number, heightPx: number, orientation: Device['orientation'] = 'landscape'): Device => ({ preset: 'custom', widthPx, heightPx, orientation });
const grid: Grid = { columns: 16, rows: 10, gapPx: 8 };
/** Measured on the bare grid (canvas = the whole device), so the hand arithmetic below stays simple. */
const bare = (d: Device) => ({ canvasPx: deviceSize(d) });
const make = <K extends Tile['kind']>(kind: K, size: { w: number; h: number }) => ({ ...TILE_CATALOGUE[kind].create(kind, { x: 0, y: 0 }), ...size });

describe('optionColumns', () => {
  it('lines options up in a wide box, stacks them in a tall one, and squares them between', () => {
    expect(optionColumns(4, 4)).toBe(4);
    expect(optionColumns(4, 0.25)).toBe(1);
    expect(optionColumns(4, 1)).toBe(2);
    expect(optionColumns(1, 10)).toBe(1);
  });
});

describe('headingHeightPx', () => {
  it('is 3 cqmin plus a 1.25 line of 11–20 px type', () => {
    expect(headingHeightPx(100)).toBeCloseTo(3 + 1.25 * 11, 10);
    expect(headingHeightPx(200)).toBeCloseTo(6 + 1.25 * 14, 10);
    expect(headingHeightPx(400)).toBeCloseTo(12 + 1.25 * 20, 10);
  });
});

describe('pads', () => {
  it('tap on the whole tile less a 3 cqmin margin', () => {
    // 1280 × 800 over 16 × 10 is 80 px cells; a 2 × 1 pad is 152 × 72 px, cqmin 0.72 px, margin 2.16 px.
    const [pad] = tileTouchTargets(make('push-pad', { w: 2, h: 1 }), device(1280, 800), grid, bare(device(1280, 800)));
    expect(pad!.widthPx).toBeCloseTo(152 - 4.32, 9);
    expect(pad!.heightPx).toBeCloseTo(72 - 4.32, 9);
    expect(pad!.rectPx).toMatchObject({ xPx: 4 + 2.16, yPx: 4 + 2.16 });
  });
});

describe('option pickers', () => {
  const level = make('level-picker', { w: 1, h: 2 });

  it('stack a 1 × 2 level picker’s four levels and size them from the device (hand-computed)', () => {
    // 1280 × 800: box 72 × 152, cqmin 0.72; heading 2.16 + 1.25 × 11 = 15.91; padding 2.16; gaps 1.8.
    // Buttons: width 72 − 4.32 = 67.68; height (152 − 15.91 − 4.32 − 3 × 1.8) / 4 = 31.59.
    const at1280 = tileTouchTargets(level, device(1280, 800), grid, bare(device(1280, 800)));
    expect(at1280.map((t) => t.key)).toEqual(['L4', 'L3', 'L2', 'L1']);
    expect(at1280[0]!.widthPx).toBeCloseTo(67.68, 2);
    expect(at1280[0]!.heightPx).toBeCloseTo(31.5925, 3);
    // Stacked top to bottom, one gap apart.
    expect(at1280[1]!.rectPx!.yPx - (at1280[0]!.rectPx!.yPx + at1280[0]!.heightPx)).toBeCloseTo(1.8, 9);
    // 1920 × 1200: box 112 × 232, cqmin 1.12; heading 3.36 + 13.75; buttons (232 − 17.11 − 6.72 − 8.4) / 4 = 49.94.
    expect(pickerButtonSize(level, device(1920, 1200), grid, bare(device(1920, 1200))).heightPx).toBeCloseTo(49.9425, 3);
    // Portrait 800 × 1280: 50 × 128 px cells, box 42 × 248: tall enough, but only 42 − 2.52 = 39.48 wide.
    expect(pickerButtonSize(level, device(1280, 800, 'portrait'), grid, bare(device(1280, 800, 'portrait'))).widthPx).toBeCloseTo(39.48, 2);
  });

  it('lays a wide cage picker out in a row', () => {
    const cage = make('cage-picker', { w: 4, h: 1 });
    const targets = tileTouchTargets(cage, device(1280, 800), grid, bare(device(1280, 800)));
    expect(new Set(targets.map((t) => t.rectPx!.yPx)).size).toBe(1);
    // 312 × 72 box, cqmin 0.72: (312 − 4.32 − 3 × 1.8) / 4 = 75.57 wide.
    expect(targets[0]!.widthPx).toBeCloseTo(75.57, 2);
  });
});

describe('reef picker', () => {
  it('finds the largest square in a ring sector (closed form where the sides bind)', () => {
    // With the square's inner corners on the sector's sides, its inner edge is at s / (2 tan(θ/2)) and its
    // outer corners on the outer circle: (s / (2t) + s)² + (s/2)² = R², so s = R / √((1/(2t) + 1)² + 1/4).
    const t = Math.tan(((28.4 / 2) * Math.PI) / 180);
    const closed = 2.03 / Math.sqrt((1 / (2 * t) + 1) ** 2 + 0.25);
    expect(largestSquareInRingSector(1.1, 2.03, 28.4)).toBeCloseTo(closed, 9);
    // Where the inner circle binds instead (a thin ring), the depth limits it: the square cannot exceed it.
    expect(largestSquareInRingSector(1.9, 2.0, 60)).toBeLessThanOrEqual(0.1);
    expect(largestSquareInRingSector(1.9, 2.0, 60)).toBeGreaterThan(0.09);
    expect(largestSquareInRingSector(2, 1, 30)).toBe(0);
  });

  it('has 12 equal branch buttons that shrink with the device', () => {
    const reef = make('reef-picker', { w: 4, h: 4 });
    const targets = tileTouchTargets(reef, device(1280, 800), grid, bare(device(1280, 800)));
    expect(targets.map((t) => t.key)).toEqual([...season2025.reef.branchLetters.value]);
    // 312 × 312 box, cqmin 3.12: heading 9.36 + 25 = 34.36, padding 6.24 → a 265.16 px square for 4.1 m.
    const innerR = Math.max(season2025.reefs.blue.centreToFaceM.value, season2025.reefs.red.centreToFaceM.value) / Math.cos(Math.PI / 6) + 0.14;
    const sideM = largestSquareInRingSector(innerR, 2.03, 28.4);
    expect(targets[0]!.widthPx).toBeCloseTo((265.16 / 4.1) * sideM, 6);
    expect(targets[0]!.widthPx).toBeLessThan(44);
    expect(pickerButtonSize(reef, device(1920, 1200), grid, bare(device(1920, 1200))).widthPx).toBeGreaterThan(44);
  });
});

describe('run mode’s canvas', () => {
  it('is the screen less the status strip, the device’s shape kept', () => {
    expect(RUN_STATUS_STRIP_PX).toBe(56);
    // 1280 × 800: the canvas fits 744 px high, so it is 744 / 800 = 0.93 of the device: 1190.4 × 744.
    const landscape = runCanvasSize(device(1280, 800));
    expect(landscape.widthPx).toBeCloseTo(1190.4, 9);
    expect(landscape.heightPx).toBeCloseTo(744, 9);
    // Portrait 800 × 1280: 1224 / 1280 = 0.95625 → 765 × 1224.
    const portrait = runCanvasSize(device(1280, 800, 'portrait'));
    expect(portrait.widthPx).toBeCloseTo(765, 9);
    expect(portrait.heightPx).toBeCloseTo(1224, 9);
  });

  it('is what targets are measured on unless told otherwise', () => {
    // A 2 × 1 pad on 16 × 10 at 1280 × 800 in run mode: cells 74.4 px, box 140.8 × 66.4, cqmin 0.664.
    const [pad] = tileTouchTargets(make('push-pad', { w: 2, h: 1 }), device(1280, 800), grid);
    expect(pad!.widthPx).toBeCloseTo(140.8 - 6 * 0.664, 9);
    expect(pad!.heightPx).toBeCloseTo(66.4 - 6 * 0.664, 9);
  });
});

describe('tiles nobody taps', () => {
  it.each(['lamp', 'readout', 'match-clock', 'caption', 'target-echo'] as const)('%s has no touch targets', (kind) => {
    const tile = make(kind, { w: 2, h: 1 });
    expect(tileTouchTargets(tile, device(1280, 800), grid, bare(device(1280, 800)))).toEqual([]);
    expect(pickerButtonSize(tile, device(1280, 800), grid, bare(device(1280, 800)))).toEqual({ widthPx: 0, heightPx: 0 });
  });
});
