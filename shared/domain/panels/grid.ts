// Pure: imports only shared files. Grid metrics of a panel: the device's CSS size, the cell size, the box a
// tile is drawn in, and pointer positions (in device CSS px) turned into cells.
//
// The canvas is the whole device screen (run mode draws no chrome over it) split into `columns × rows`
// equal cells. A tile covering cells [x, x + w) × [y, y + h) is drawn inset by half the gap on every side,
// so two neighbouring tiles are exactly `gapPx` apart and the outermost tiles stand `gapPx / 2` from the edge.
import type { Device, Grid } from '../../schemas/panel';

export type SizePx = { widthPx: number; heightPx: number };
export type PointPx = { xPx: number; yPx: number };
export type RectPx = { xPx: number; yPx: number; widthPx: number; heightPx: number };
/** A place in cells from the top-left of the grid. */
export type Cell = { x: number; y: number };
/** A size in cells. */
export type CellSize = { w: number; h: number };
/** Anything placed on the grid in cells (a tile is one). */
export type CellRect = { x: number; y: number; w: number; h: number };

/** The screen's CSS size as the panel is held: portrait swaps the landscape width and height. */
export function deviceSize(device: Pick<Device, 'widthPx' | 'heightPx' | 'orientation'>): SizePx {
  return device.orientation === 'portrait'
    ? { widthPx: device.heightPx, heightPx: device.widthPx }
    : { widthPx: device.widthPx, heightPx: device.heightPx };
}

/** One cell's CSS size (not rounded: 1280 px over 12 columns is 106.67 px). */
export function cellSize(device: Pick<Device, 'widthPx' | 'heightPx' | 'orientation'>, grid: Pick<Grid, 'columns' | 'rows'>): SizePx {
  const screen = deviceSize(device);
  return { widthPx: screen.widthPx / grid.columns, heightPx: screen.heightPx / grid.rows };
}

/** The box a tile is drawn in, in device CSS px: its cells times the cell size, less the gap. Never negative. */
export function tileRectPx(tile: CellRect, device: Pick<Device, 'widthPx' | 'heightPx' | 'orientation'>, grid: Grid): RectPx {
  const cell = cellSize(device, grid);
  const halfGapPx = grid.gapPx / 2;
  return {
    xPx: tile.x * cell.widthPx + halfGapPx,
    yPx: tile.y * cell.heightPx + halfGapPx,
    widthPx: Math.max(0, tile.w * cell.widthPx - grid.gapPx),
    heightPx: Math.max(0, tile.h * cell.heightPx - grid.gapPx),
  };
}

/** The cell under a pointer (device CSS px), clamped onto the grid so a pointer past an edge gives the edge cell. */
export function pxToCell(point: PointPx, device: Pick<Device, 'widthPx' | 'heightPx' | 'orientation'>, grid: Pick<Grid, 'columns' | 'rows'>): Cell {
  const cell = cellSize(device, grid);
  return {
    x: clampInt(Math.floor(point.xPx / cell.widthPx), 0, grid.columns - 1),
    y: clampInt(Math.floor(point.yPx / cell.heightPx), 0, grid.rows - 1),
  };
}

/**
 * Where a tile of `size` cells lands when its top-left corner is dropped at `point` (device CSS px): the
 * nearest cell corner, clamped so the whole tile stays on the grid (a tile larger than the grid sits at 0).
 */
export function snapToCell(
  point: PointPx,
  device: Pick<Device, 'widthPx' | 'heightPx' | 'orientation'>,
  grid: Pick<Grid, 'columns' | 'rows'>,
  size: CellSize = { w: 1, h: 1 },
): Cell {
  const cell = cellSize(device, grid);
  return {
    x: clampInt(Math.round(point.xPx / cell.widthPx), 0, Math.max(0, grid.columns - size.w)),
    y: clampInt(Math.round(point.yPx / cell.heightPx), 0, Math.max(0, grid.rows - size.h)),
  };
}

/** A pointer movement (device CSS px) as whole cells, rounded to the nearest: what a drag or resize moves by. */
export function pxDeltaToCells(
  delta: { dxPx: number; dyPx: number },
  device: Pick<Device, 'widthPx' | 'heightPx' | 'orientation'>,
  grid: Pick<Grid, 'columns' | 'rows'>,
): { dx: number; dy: number } {
  const cell = cellSize(device, grid);
  // `+ 0` turns a rounded −0 into 0, so callers comparing with 0 or printing the value see what they expect.
  return { dx: Math.round(delta.dxPx / cell.widthPx) + 0, dy: Math.round(delta.dyPx / cell.heightPx) + 0 };
}

/** Whether a cell rectangle lies wholly on the grid. */
export function fitsGrid(rect: CellRect, grid: Pick<Grid, 'columns' | 'rows'>): boolean {
  return rect.x >= 0 && rect.y >= 0 && rect.w >= 1 && rect.h >= 1 && rect.x + rect.w <= grid.columns && rect.y + rect.h <= grid.rows;
}

/** Whether two cell rectangles share at least one cell (touching edges do not). */
export function cellRectsOverlap(a: CellRect, b: CellRect): boolean {
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}

/**
 * The scale at which the device canvas fits into an area on the designer's screen (never above 1 unless
 * `allowUpscale`); divide pointer offsets on the scaled canvas by it to get device CSS px.
 */
export function fitScale(device: Pick<Device, 'widthPx' | 'heightPx' | 'orientation'>, area: SizePx, allowUpscale = false): number {
  const screen = deviceSize(device);
  if (area.widthPx <= 0 || area.heightPx <= 0) return 0;
  const scale = Math.min(area.widthPx / screen.widthPx, area.heightPx / screen.heightPx);
  return allowUpscale ? scale : Math.min(1, scale);
}

function clampInt(value: number, min: number, max: number): number {
  return Math.min(max, Math.max(min, value));
}
