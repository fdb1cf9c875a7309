import { describe, expect, it } from 'vitest';
import type { Device, Grid } from '../../schemas/panel';
import { cellRectsOverlap, cellSize, deviceSize, fitScale, fitsGrid, pxDeltaToCells, pxToCell, snapToCell, tileRectPx } from './grid';

const tablet: Device = { preset: 'tablet-1280x800', widthPx: 1280, heightPx: 800, orientation: 'landscape' };
const portrait: Device = { ...tablet, orientation: 'portrait' };
const grid: Grid = { columns: 12, rows: 8, gapPx: 8 };

describe('device and cell size', () => {
  it('keeps landscape and swaps portrait', () => {
    expect(deviceSize(tablet)).toEqual({ widthPx: 1280, heightPx: 800 });
    expect(deviceSize(portrait)).toEqual({ widthPx: 800, heightPx: 1280 });
  });

  it('splits the screen into equal cells', () => {
    const cell = cellSize(tablet, grid);
    expect(cell.widthPx).toBeCloseTo(1280 / 12, 10);
    expect(cell.heightPx).toBe(100);
    // 12 columns times the cell width is the screen width again, portrait included.
    expect(cellSize(portrait, grid).widthPx * grid.columns).toBeCloseTo(800, 9);
    expect(cellSize(portrait, grid).heightPx * grid.rows).toBeCloseTo(1280, 9);
  });
});

describe('tileRectPx', () => {
  it('is the cells times the cell size, inset by half the gap on each side', () => {
    const rect = tileRectPx({ x: 3, y: 2, w: 2, h: 3 }, { ...tablet, widthPx: 1200 }, grid);
    // 1200 / 12 = 100 px per column, 800 / 8 = 100 px per row.
    expect(rect).toEqual({ xPx: 304, yPx: 204, widthPx: 192, heightPx: 292 });
  });

  it('leaves exactly one gap between neighbours and half a gap at the edges', () => {
    const left = tileRectPx({ x: 0, y: 0, w: 5, h: 1 }, tablet, grid);
    const right = tileRectPx({ x: 5, y: 0, w: 7, h: 1 }, tablet, grid);
    expect(left.xPx).toBe(4);
    expect(right.xPx - (left.xPx + left.widthPx)).toBeCloseTo(8, 9);
    expect(1280 - (right.xPx + right.widthPx)).toBeCloseTo(4, 9);
  });

  it('never goes negative when the gap is wider than the cells', () => {
    const rect = tileRectPx({ x: 0, y: 0, w: 1, h: 1 }, { ...tablet, widthPx: 320, heightPx: 240 }, { columns: 48, rows: 48, gapPx: 32 });
    expect(rect.widthPx).toBe(0);
    expect(rect.heightPx).toBe(0);
  });
});

describe('pointer positions to cells', () => {
  const even: Device = { ...tablet, widthPx: 1200 };

  it('finds the cell under a pointer and clamps past the edges', () => {
    expect(pxToCell({ xPx: 0, yPx: 0 }, even, grid)).toEqual({ x: 0, y: 0 });
    expect(pxToCell({ xPx: 99.9, yPx: 100 }, even, grid)).toEqual({ x: 0, y: 1 });
    expect(pxToCell({ xPx: 5000, yPx: -20 }, even, grid)).toEqual({ x: 11, y: 0 });
  });

  it('snaps a drop to the nearest corner and keeps the tile on the grid', () => {
    expect(snapToCell({ xPx: 149, yPx: 251 }, even, grid)).toEqual({ x: 1, y: 3 });
    expect(snapToCell({ xPx: 151, yPx: 249 }, even, grid)).toEqual({ x: 2, y: 2 });
    expect(snapToCell({ xPx: 1150, yPx: 790 }, even, grid, { w: 4, h: 3 })).toEqual({ x: 8, y: 5 });
    expect(snapToCell({ xPx: -300, yPx: 10 }, even, grid, { w: 20, h: 1 })).toEqual({ x: 0, y: 0 });
  });

  it('rounds drag deltas to whole cells, without a negative zero', () => {
    expect(pxDeltaToCells({ dxPx: 149, dyPx: -151 }, even, grid)).toEqual({ dx: 1, dy: -2 });
    expect(Object.is(pxDeltaToCells({ dxPx: -10, dyPx: 0 }, even, grid).dx, 0)).toBe(true);
  });

  it('uses the portrait cell size for a portrait device', () => {
    // Portrait 800 × 1280 over 8 columns × 8 rows: 100 × 160 px cells.
    expect(pxToCell({ xPx: 750, yPx: 1279 }, portrait, { columns: 8, rows: 8 })).toEqual({ x: 7, y: 7 });
  });
});

describe('grid rectangles', () => {
  it('knows what fits and what overlaps', () => {
    expect(fitsGrid({ x: 8, y: 5, w: 4, h: 3 }, grid)).toBe(true);
    expect(fitsGrid({ x: 9, y: 5, w: 4, h: 3 }, grid)).toBe(false);
    expect(cellRectsOverlap({ x: 0, y: 0, w: 2, h: 2 }, { x: 1, y: 1, w: 2, h: 2 })).toBe(true);
    expect(cellRectsOverlap({ x: 0, y: 0, w: 2, h: 2 }, { x: 2, y: 0, w: 2, h: 2 })).toBe(false);
  });

  it('scales the canvas to fit an area', () => {
    expect(fitScale(tablet, { widthPx: 640, heightPx: 1000 })).toBe(0.5);
    expect(fitScale(tablet, { widthPx: 2560, heightPx: 1600 })).toBe(1);
    expect(fitScale(tablet, { widthPx: 2560, heightPx: 1600 }, true)).toBe(2);
    expect(fitScale(tablet, { widthPx: 0, heightPx: 10 })).toBe(0);
  });
});
