// Pure: imports only shared files. The touch targets a tile offers in run mode and their size in CSS px at
// the panel's device size: what the panel check measures against WCAG 2.5.5 / 2.5.8.
//
// These formulas restate the layout the tile renderers draw (client/components/panel-tiles/): inside a tile's
// box (tileRectPx), one `cqmin` is 1 % of the box's shorter side; the heading line is `3cqmin` of top padding
// plus one line of `clamp(11px, 7cqmin, 20px)` type at line height 1.25; an option picker's buttons sit in an
// equal-cell grid with `3cqmin` padding and `2.5cqmin` gaps, its columns chosen by `optionColumns`; a pad is
// the whole box less a `3cqmin` margin; the reef picker draws a square SVG (viewBox 2 × 2.05 m, `2cqmin`
// padding) of the reef ringed by twelve 28.4° ring sectors from the hexagon's corner radius + 0.14 m out to
// 2.03 m. Change both together.
//
// Run mode (client/features/run/components/) draws a status strip RUN_STATUS_STRIP_PX high across the top
// and fits the page below it keeping the device's shape, so on the device itself every tile is drawn a little
// smaller than the grid alone says (1280 × 800 → 1190.4 × 744); targets are measured on that canvas.
import type { Device, Grid, Tile } from '../../schemas/panel';
import { season2025 } from '../season/season-2025';
import type { SeasonProfile } from '../season/season-profile';
import { deviceSize, fitScale, tileRectPx, type RectPx, type SizePx } from './grid';

/** Height of run mode's status strip (Tailwind h-14 in run-status-strip.tsx), CSS px. */
export const RUN_STATUS_STRIP_PX = 56;

/** The CSS size run mode draws the panel's canvas at on the device: the screen less the strip, device shape kept. */
export function runCanvasSize(device: Pick<Device, 'widthPx' | 'heightPx' | 'orientation'>): SizePx {
  const screen = deviceSize(device);
  const scale = fitScale(device, { widthPx: screen.widthPx, heightPx: screen.heightPx - RUN_STATUS_STRIP_PX }, true);
  return { widthPx: screen.widthPx * scale, heightPx: screen.heightPx * scale };
}

/** One thing an operator taps. `rectPx` is its box on the device, where it does not depend on the seat. */
export type TouchTarget = {
  /** Stable within the tile: the option value, the branch letter, or `pad`. */
  key: string;
  label: string;
  /** The target's size for WCAG: for a box its width and height; for a ring sector the largest square inside it. */
  widthPx: number;
  heightPx: number;
  rectPx?: RectPx;
};

/** The renderers' layout constants (client/components/panel-tiles/). */
export const TILE_LAYOUT = {
  headingTopPadCqmin: 3,
  headingFontCqmin: 7,
  headingFontMinPx: 11,
  headingFontMaxPx: 20,
  headingLineHeight: 1.25,
  optionPadCqmin: 3,
  optionGapCqmin: 2.5,
  padMarginCqmin: 3,
  reefPadCqmin: 2,
  reefViewHalfM: 2.05,
  reefRingGapM: 0.14,
  reefRingOuterM: 2.03,
  reefSectorGapDeg: 1.6,
} as const;

/** Columns for `count` options in a box of `aspect` (width ÷ height): the most square buttons win; ties keep fewer columns. */
export function optionColumns(count: number, aspect: number): number {
  if (count <= 1) return 1;
  let best = { columns: 1, score: -Infinity };
  for (let columns = 1; columns <= count; columns += 1) {
    const rows = Math.ceil(count / columns);
    const score = Math.min(aspect / columns, 1 / rows) - (columns * rows - count) * 0.01;
    if (score > best.score) best = { columns, score };
  }
  return best.columns;
}

/** The heading line's height in px inside a box whose shorter side is `minSidePx`. */
export function headingHeightPx(minSidePx: number): number {
  const cq = minSidePx / 100;
  const fontPx = Math.min(TILE_LAYOUT.headingFontMaxPx, Math.max(TILE_LAYOUT.headingFontMinPx, TILE_LAYOUT.headingFontCqmin * cq));
  return TILE_LAYOUT.headingTopPadCqmin * cq + TILE_LAYOUT.headingLineHeight * fontPx;
}

/**
 * Side of the largest square that fits in a ring sector (inner and outer radius, sweep in degrees), the
 * square standing on the sector's middle line: its inner edge must clear the inner circle, its inner
 * corners the sector's sides, and its outer corners the outer circle.
 */
export function largestSquareInRingSector(innerR: number, outerR: number, sweepDeg: number): number {
  const halfTan = Math.tan(((sweepDeg / 2) * Math.PI) / 180);
  const fits = (side: number) => {
    const innerEdge = Math.max(innerR, side / (2 * halfTan));
    return (innerEdge + side) ** 2 + (side / 2) ** 2 <= outerR ** 2;
  };
  let lo = 0;
  let hi = Math.max(0, outerR - innerR);
  for (let i = 0; i < 60; i += 1) {
    const mid = (lo + hi) / 2;
    if (fits(mid)) lo = mid;
    else hi = mid;
  }
  return lo;
}

type DeviceSize = Pick<Device, 'widthPx' | 'heightPx' | 'orientation'>;

export type TouchTargetOptions = {
  /** The season whose reef the reef picker draws (default 2025). */
  season?: SeasonProfile;
  /** The CSS size the canvas is drawn at; default `runCanvasSize(device)`. Pass `deviceSize(device)` for the bare grid. */
  canvasPx?: SizePx;
};

/**
 * Every target of a tile as run mode lays it out on the device, in CSS px of the drawn canvas (its boxes
 * relative to the canvas's top-left); tiles nobody taps (lamps, readouts, clock, caption, echo) have none.
 */
export function tileTouchTargets(tile: Tile, device: DeviceSize, grid: Grid, options: TouchTargetOptions = {}): TouchTarget[] {
  const season = options.season ?? season2025;
  const canvas = options.canvasPx ?? runCanvasSize(device);
  const box = tileRectPx(tile, { widthPx: canvas.widthPx, heightPx: canvas.heightPx, orientation: 'landscape' }, grid);
  const cq = Math.min(box.widthPx, box.heightPx) / 100;
  switch (tile.kind) {
    case 'push-pad':
    case 'latch-pad': {
      const marginPx = TILE_LAYOUT.padMarginCqmin * cq;
      const rectPx = inset(box, marginPx, marginPx, marginPx, marginPx);
      return [{ key: 'pad', label: tile.label, widthPx: rectPx.widthPx, heightPx: rectPx.heightPx, rectPx }];
    }
    case 'level-picker':
    case 'station-picker':
    case 'algae-picker':
    case 'cage-picker':
    case 'choice-pad': {
      const screen = deviceSize(device);
      // The renderer chooses columns from the tile's grid box (gap included), so do the same.
      const aspect = ((tile.w / grid.columns) * screen.widthPx) / ((tile.h / grid.rows) * screen.heightPx);
      const count = tile.options.length;
      const columns = optionColumns(count, aspect);
      const rows = Math.ceil(count / columns);
      const padPx = TILE_LAYOUT.optionPadCqmin * cq;
      const gapPx = TILE_LAYOUT.optionGapCqmin * cq;
      const area = inset(box, headingHeightPx(Math.min(box.widthPx, box.heightPx)) + padPx, padPx, padPx, padPx);
      const widthPx = Math.max(0, (area.widthPx - (columns - 1) * gapPx) / columns);
      const heightPx = Math.max(0, (area.heightPx - (rows - 1) * gapPx) / rows);
      return tile.options.map((o, i) => ({
        key: o.value,
        label: o.label,
        widthPx,
        heightPx,
        rectPx: { xPx: area.xPx + (i % columns) * (widthPx + gapPx), yPx: area.yPx + Math.floor(i / columns) * (heightPx + gapPx), widthPx, heightPx },
      }));
    }
    case 'reef-picker': {
      const side = reefGeometryIn(box, season).buttonSidePx;
      return season.reef.branchLetters.value.map((letter) => ({ key: letter, label: `Branch ${letter}`, widthPx: side, heightPx: side }));
    }
    case 'lamp':
    case 'readout':
    case 'match-clock':
    case 'caption':
    case 'target-echo':
      return [];
  }
}

/** The size of a picker's (or pad's) smallest button in run mode on the device; zero for a tile nobody taps. */
export function pickerButtonSize(tile: Tile, device: DeviceSize, grid: Grid, options: TouchTargetOptions = {}): SizePx {
  const targets = tileTouchTargets(tile, device, grid, options);
  if (targets.length === 0) return { widthPx: 0, heightPx: 0 };
  return {
    widthPx: Math.min(...targets.map((t) => t.widthPx)),
    heightPx: Math.min(...targets.map((t) => t.heightPx)),
  };
}

export type ReefPickerGeometry = {
  /** Side of the square reef drawing (the SVG's viewBox fitted into the tile below its heading), CSS px. */
  drawingSidePx: number;
  pxPerM: number;
  /** The branch buttons' ring, view metres: from the hexagon's corner radius + the ring gap out to the outer edge. */
  innerRM: number;
  outerRM: number;
  /** Sweep of one branch button, degrees (30° less the gap between buttons). */
  sweepDeg: number;
  /** Side of the largest square inside one branch button, CSS px. */
  buttonSidePx: number;
};

/** How big run mode draws a reef picker's reef and branch buttons. */
export function reefPickerGeometry(tile: Tile, device: DeviceSize, grid: Grid, options: TouchTargetOptions = {}): ReefPickerGeometry {
  const season = options.season ?? season2025;
  const canvas = options.canvasPx ?? runCanvasSize(device);
  const box = tileRectPx(tile, { widthPx: canvas.widthPx, heightPx: canvas.heightPx, orientation: 'landscape' }, grid);
  return reefGeometryIn(box, season);
}

function reefGeometryIn(box: RectPx, season: SeasonProfile): ReefPickerGeometry {
  const minSidePx = Math.min(box.widthPx, box.heightPx);
  const cq = minSidePx / 100;
  const padPx = TILE_LAYOUT.reefPadCqmin * cq;
  const areaWidthPx = box.widthPx - 2 * padPx;
  const areaHeightPx = box.heightPx - headingHeightPx(minSidePx) - 2 * padPx;
  const drawingSidePx = Math.max(0, Math.min(areaWidthPx, areaHeightPx));
  const pxPerM = drawingSidePx / (2 * TILE_LAYOUT.reefViewHalfM);
  // The larger reef of the two alliances gives the narrower ring: measure that one.
  const centreToFaceM = Math.max(season.reefs.blue.centreToFaceM.value, season.reefs.red.centreToFaceM.value);
  const innerRM = centreToFaceM / Math.cos(Math.PI / 6) + TILE_LAYOUT.reefRingGapM;
  const outerRM = TILE_LAYOUT.reefRingOuterM;
  const sweepDeg = 360 / 12 - TILE_LAYOUT.reefSectorGapDeg;
  return { drawingSidePx, pxPerM, innerRM, outerRM, sweepDeg, buttonSidePx: largestSquareInRingSector(innerRM, outerRM, sweepDeg) * pxPerM };
}

function inset(box: RectPx, topPx: number, rightPx: number, bottomPx: number, leftPx: number): RectPx {
  return {
    xPx: box.xPx + leftPx,
    yPx: box.yPx + topPx,
    widthPx: Math.max(0, box.widthPx - leftPx - rightPx),
    heightPx: Math.max(0, box.heightPx - topPx - bottomPx),
  };
}
