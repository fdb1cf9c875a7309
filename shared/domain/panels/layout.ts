// Pure: imports only zod-derived types from shared/schemas; no DOM, clocks or randomness (new ids are passed in).
// Editing operations on a panel document. Every operation returns a new document (the "plan") and leaves its
// input untouched; an operation that changes nothing returns the very same document, so a caller can tell.
import type { Device, Grid, Page, PanelDocument, Theme, ThemeColour, Tile, TileKind } from '../../schemas/panel';

/** A cell position on the grid, counted from the top-left cell (0, 0). */
export type Cell = { x: number; y: number };
/** A size in cells. */
export type CellSize = { w: number; h: number };
/** A rectangle in cells. */
export type CellRect = Cell & CellSize;

/** The smallest size in cells a tile of a kind may take. */
export type MinSizeOf = (kind: TileKind) => CellSize;
const ONE_CELL: MinSizeOf = () => ({ w: 1, h: 1 });

export const MAX_PAGES = 8;

const clamp = (v: number, lo: number, hi: number) => Math.min(Math.max(v, lo), hi);

/** The page with `pageId`, or undefined. */
export function findPage(doc: PanelDocument, pageId: string): Page | undefined {
  return doc.pages.find((p) => p.id === pageId);
}

/** The tile `tileId` on page `pageId`, or undefined. */
export function findTile(doc: PanelDocument, pageId: string, tileId: string): Tile | undefined {
  return findPage(doc, pageId)?.tiles.find((t) => t.id === tileId);
}

/**
 * `rect` made to fit a `columns × rows` grid: the size first (at least `min`, at most the grid), then the
 * position so the whole rectangle is inside. Cells are whole numbers, so inputs are rounded.
 */
export function clampRect(rect: CellRect, grid: Pick<Grid, 'columns' | 'rows'>, min: CellSize = { w: 1, h: 1 }): CellRect {
  const w = clamp(Math.round(rect.w), Math.min(min.w, grid.columns), grid.columns);
  const h = clamp(Math.round(rect.h), Math.min(min.h, grid.rows), grid.rows);
  return { x: clamp(Math.round(rect.x), 0, grid.columns - w), y: clamp(Math.round(rect.y), 0, grid.rows - h), w, h };
}

/** A pointer offset in CSS px turned into whole cells (nearest cell), given one cell's size in px. */
export function snapOffset(dxPx: number, dyPx: number, cellWidthPx: number, cellHeightPx: number): { dx: number; dy: number } {
  // `+ 0` turns -0 into 0, so "no move" compares equal to { dx: 0, dy: 0 }.
  return { dx: Math.round(dxPx / cellWidthPx) + 0, dy: Math.round(dyPx / cellHeightPx) + 0 };
}

function withPage(doc: PanelDocument, pageId: string, edit: (page: Page) => Page): PanelDocument {
  let changed = false;
  const pages = doc.pages.map((p) => {
    if (p.id !== pageId) return p;
    const next = edit(p);
    if (next !== p) changed = true;
    return next;
  });
  return changed ? { ...doc, pages } : doc;
}

function withTiles(doc: PanelDocument, pageId: string, ids: ReadonlySet<string>, edit: (tile: Tile) => Tile): PanelDocument {
  return withPage(doc, pageId, (page) => {
    let changed = false;
    const tiles = page.tiles.map((t) => {
      if (!ids.has(t.id)) return t;
      const next = edit(t);
      if (next !== t && !samePlacementAndProps(next, t)) {
        changed = true;
        return next;
      }
      return t;
    });
    return changed ? { ...page, tiles } : page;
  });
}

function samePlacementAndProps(a: Tile, b: Tile): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  for (const k of keys) {
    const av = (a as Record<string, unknown>)[k];
    const bv = (b as Record<string, unknown>)[k];
    if (av !== bv && JSON.stringify(av) !== JSON.stringify(bv)) return false;
  }
  return true;
}

function placed(tile: Tile, rect: CellRect): Tile {
  if (tile.x === rect.x && tile.y === rect.y && tile.w === rect.w && tile.h === rect.h) return tile;
  return { ...tile, x: rect.x, y: rect.y, w: rect.w, h: rect.h };
}

/**
 * Adds `tile` (e.g. made by the tile catalogue) to a page, moved and shrunk as needed to lie inside the grid.
 * A tile whose id is already on the page, or a page that is full (200 tiles), leaves the document as it was.
 */
export function addTile(doc: PanelDocument, pageId: string, tile: Tile, minSizeOf: MinSizeOf = ONE_CELL): PanelDocument {
  return withPage(doc, pageId, (page) => {
    if (page.tiles.length >= 200 || page.tiles.some((t) => t.id === tile.id)) return page;
    return { ...page, tiles: [...page.tiles, placed(tile, clampRect(tile, doc.grid, minSizeOf(tile.kind)))] };
  });
}

/** Moves one tile so its top-left is `to`, kept inside the grid. */
export function moveTile(doc: PanelDocument, pageId: string, tileId: string, to: Cell): PanelDocument {
  return withTiles(doc, pageId, new Set([tileId]), (t) => placed(t, clampRect({ ...t, x: to.x, y: to.y }, doc.grid, t)));
}

/**
 * The offset actually applied when the tiles `ids` move together by (dx, dy) cells: reduced so the whole
 * group stays inside the grid and keeps its shape (no tile is pushed against the edge on its own).
 */
export function groupOffset(doc: PanelDocument, pageId: string, ids: readonly string[], dx: number, dy: number): { dx: number; dy: number } {
  const tiles = findPage(doc, pageId)?.tiles.filter((t) => ids.includes(t.id)) ?? [];
  if (tiles.length === 0) return { dx: 0, dy: 0 };
  const minX = Math.min(...tiles.map((t) => t.x));
  const minY = Math.min(...tiles.map((t) => t.y));
  const maxX = Math.max(...tiles.map((t) => t.x + t.w));
  const maxY = Math.max(...tiles.map((t) => t.y + t.h));
  return {
    dx: clamp(Math.round(dx), -minX, Math.max(0, doc.grid.columns - maxX)) + 0,
    dy: clamp(Math.round(dy), -minY, Math.max(0, doc.grid.rows - maxY)) + 0,
  };
}

/** Moves the selected tiles together by (dx, dy) cells, as far as the grid allows (see `groupOffset`). */
export function moveTiles(doc: PanelDocument, pageId: string, ids: readonly string[], dx: number, dy: number): PanelDocument {
  const offset = groupOffset(doc, pageId, ids, dx, dy);
  if (offset.dx === 0 && offset.dy === 0) return doc;
  return withTiles(doc, pageId, new Set(ids), (t) => placed(t, { x: t.x + offset.dx, y: t.y + offset.dy, w: t.w, h: t.h }));
}

/** Which edge or corner of a tile a resize handle drags. */
export type ResizeHandle = 'n' | 's' | 'e' | 'w' | 'ne' | 'nw' | 'se' | 'sw';

/**
 * The rectangle of `tile` after dragging its `handle` by (dx, dy) cells: the opposite edge stays put, the size
 * is at least `min` and the rectangle stays inside the grid.
 */
export function resizedRect(tile: CellRect, handle: ResizeHandle, dx: number, dy: number, grid: Pick<Grid, 'columns' | 'rows'>, min: CellSize): CellRect {
  const minW = Math.min(min.w, grid.columns);
  const minH = Math.min(min.h, grid.rows);
  let left = tile.x;
  let right = tile.x + tile.w;
  let top = tile.y;
  let bottom = tile.y + tile.h;
  if (handle.includes('w')) left = clamp(tile.x + Math.round(dx), 0, right - minW);
  if (handle.includes('e')) right = clamp(right + Math.round(dx), left + minW, grid.columns);
  if (handle.includes('n')) top = clamp(tile.y + Math.round(dy), 0, bottom - minH);
  if (handle.includes('s')) bottom = clamp(bottom + Math.round(dy), top + minH, grid.rows);
  return { x: left, y: top, w: right - left, h: bottom - top };
}

/** Resizes one tile by dragging a handle (see `resizedRect`). */
export function resizeTile(
  doc: PanelDocument,
  pageId: string,
  tileId: string,
  handle: ResizeHandle,
  dx: number,
  dy: number,
  minSizeOf: MinSizeOf = ONE_CELL,
): PanelDocument {
  return withTiles(doc, pageId, new Set([tileId]), (t) => placed(t, resizedRect(t, handle, dx, dy, doc.grid, minSizeOf(t.kind))));
}

/** Sets one tile's rectangle outright (the size form), clamped to the grid and the kind's minimum. */
export function setTileRect(doc: PanelDocument, pageId: string, tileId: string, rect: CellRect, minSizeOf: MinSizeOf = ONE_CELL): PanelDocument {
  return withTiles(doc, pageId, new Set([tileId]), (t) => placed(t, clampRect(rect, doc.grid, minSizeOf(t.kind))));
}

export type AlignEdge = 'left' | 'right' | 'top' | 'bottom' | 'centre-x' | 'centre-y';

/**
 * Lines the selected tiles up on the selection's bounding box: `left` moves every left edge to the leftmost
 * one, `centre-x` puts every horizontal centre on the box's centre (rounded down to a whole cell), and so on.
 * Fewer than two tiles: nothing to align.
 */
export function alignTiles(doc: PanelDocument, pageId: string, ids: readonly string[], edge: AlignEdge): PanelDocument {
  const tiles = findPage(doc, pageId)?.tiles.filter((t) => ids.includes(t.id)) ?? [];
  if (tiles.length < 2) return doc;
  const minX = Math.min(...tiles.map((t) => t.x));
  const minY = Math.min(...tiles.map((t) => t.y));
  const maxX = Math.max(...tiles.map((t) => t.x + t.w));
  const maxY = Math.max(...tiles.map((t) => t.y + t.h));
  const target = (t: Tile): Cell => {
    switch (edge) {
      case 'left':
        return { x: minX, y: t.y };
      case 'right':
        return { x: maxX - t.w, y: t.y };
      case 'top':
        return { x: t.x, y: minY };
      case 'bottom':
        return { x: t.x, y: maxY - t.h };
      case 'centre-x':
        return { x: Math.floor((minX + maxX - t.w) / 2), y: t.y };
      case 'centre-y':
        return { x: t.x, y: Math.floor((minY + maxY - t.h) / 2) };
    }
  };
  return withTiles(doc, pageId, new Set(ids), (t) => placed(t, clampRect({ ...t, ...target(t) }, doc.grid, t)));
}

/**
 * Spreads three or more selected tiles evenly along an axis: the first and last (by position) stay, and the
 * gaps between neighbours become equal, in whole cells; a remainder goes to the first gaps, one cell each.
 * When the tiles are wider together than the span, they are packed edge to edge from the first tile.
 */
export function distributeTiles(doc: PanelDocument, pageId: string, ids: readonly string[], axis: 'horizontal' | 'vertical'): PanelDocument {
  const tiles = findPage(doc, pageId)?.tiles.filter((t) => ids.includes(t.id)) ?? [];
  if (tiles.length < 3) return doc;
  const pos = (t: CellRect) => (axis === 'horizontal' ? t.x : t.y);
  const size = (t: CellRect) => (axis === 'horizontal' ? t.w : t.h);
  const sorted = [...tiles].sort((a, b) => pos(a) - pos(b) || a.id.localeCompare(b.id));
  const first = sorted[0]!;
  const last = sorted[sorted.length - 1]!;
  const span = pos(last) + size(last) - pos(first);
  const total = sorted.reduce((s, t) => s + size(t), 0);
  const free = Math.max(0, span - total);
  const gaps = sorted.length - 1;
  const base = Math.floor(free / gaps);
  const extra = free - base * gaps;
  const starts = new Map<string, number>();
  let at = pos(first);
  sorted.forEach((t, i) => {
    starts.set(t.id, at);
    at += size(t) + base + (i < extra ? 1 : 0);
  });
  return withTiles(doc, pageId, new Set(ids), (t) => {
    const start = starts.get(t.id)!;
    return placed(t, clampRect(axis === 'horizontal' ? { ...t, x: start } : { ...t, y: start }, doc.grid, t));
  });
}

/**
 * Copies the selected tiles with new ids from `newId` (called once per copy, in page order), offset by
 * (dx, dy) cells; the copies move back as a group where the offset would leave the grid. Returns the
 * document and the new ids (the new selection).
 */
export function duplicateTiles(
  doc: PanelDocument,
  pageId: string,
  ids: readonly string[],
  newId: () => string,
  offset: { dx: number; dy: number } = { dx: 1, dy: 1 },
): { doc: PanelDocument; ids: string[] } {
  const page = findPage(doc, pageId);
  const originals = page?.tiles.filter((t) => ids.includes(t.id)) ?? [];
  if (!page || originals.length === 0 || page.tiles.length + originals.length > 200) return { doc, ids: [] };
  const minX = Math.min(...originals.map((t) => t.x));
  const minY = Math.min(...originals.map((t) => t.y));
  const maxX = Math.max(...originals.map((t) => t.x + t.w));
  const maxY = Math.max(...originals.map((t) => t.y + t.h));
  const dx = clamp(offset.dx, -minX, Math.max(-minX, doc.grid.columns - maxX));
  const dy = clamp(offset.dy, -minY, Math.max(-minY, doc.grid.rows - maxY));
  const copies = originals.map((t) => {
    const copy = { ...t, id: newId() } as Tile;
    return placed(copy, clampRect({ x: t.x + dx, y: t.y + dy, w: t.w, h: t.h }, doc.grid, t));
  });
  return { doc: withPage(doc, pageId, (p) => ({ ...p, tiles: [...p.tiles, ...copies] })), ids: copies.map((t) => t.id) };
}

/** Removes the tiles `ids` from a page. */
export function deleteTiles(doc: PanelDocument, pageId: string, ids: readonly string[]): PanelDocument {
  return withPage(doc, pageId, (page) => {
    const tiles = page.tiles.filter((t) => !ids.includes(t.id));
    return tiles.length === page.tiles.length ? page : { ...page, tiles };
  });
}

/**
 * Changes a tile's properties (label, channel, options, colours …). Placement fields in the patch are
 * clamped to the grid like any move. The caller validates the values (the property form uses the schemas).
 */
export function updateTile(doc: PanelDocument, pageId: string, tileId: string, patch: Partial<Omit<Tile, 'id' | 'kind'>> | Record<string, unknown>, minSizeOf: MinSizeOf = ONE_CELL): PanelDocument {
  return withTiles(doc, pageId, new Set([tileId]), (t) => {
    const merged = { ...t, ...patch, id: t.id, kind: t.kind } as Tile;
    return placed(merged, clampRect(merged, doc.grid, minSizeOf(t.kind)));
  });
}

// ---- pages ----------------------------------------------------------------------------------------

/** Adds an empty page at the end (at most `MAX_PAGES`; a used id leaves the document as it was). */
export function addPage(doc: PanelDocument, page: { id: string; name: string }): PanelDocument {
  if (doc.pages.length >= MAX_PAGES || doc.pages.some((p) => p.id === page.id)) return doc;
  return { ...doc, pages: [...doc.pages, { id: page.id, name: page.name.trim() || `Page ${doc.pages.length + 1}`, tiles: [] }] };
}

/** Renames a page; a blank name is ignored (a page always has a name). */
export function renamePage(doc: PanelDocument, pageId: string, name: string): PanelDocument {
  const trimmed = name.trim().slice(0, 40);
  if (trimmed === '') return doc;
  return withPage(doc, pageId, (p) => (p.name === trimmed ? p : { ...p, name: trimmed }));
}

/** Deletes a page and its tiles; the last page stays (a panel has at least one). */
export function deletePage(doc: PanelDocument, pageId: string): PanelDocument {
  if (doc.pages.length <= 1 || !findPage(doc, pageId)) return doc;
  return { ...doc, pages: doc.pages.filter((p) => p.id !== pageId) };
}

/** Moves a page to `toIndex` (clamped to the list). */
export function movePage(doc: PanelDocument, pageId: string, toIndex: number): PanelDocument {
  const from = doc.pages.findIndex((p) => p.id === pageId);
  if (from < 0) return doc;
  const to = clamp(Math.round(toIndex), 0, doc.pages.length - 1);
  if (to === from) return doc;
  const pages = [...doc.pages];
  const [page] = pages.splice(from, 1);
  pages.splice(to, 0, page!);
  return { ...doc, pages };
}

// ---- device, grid, theme --------------------------------------------------------------------------

/** Changes the target device (preset, size, orientation); tiles keep their cells. */
export function setDevice(doc: PanelDocument, device: Device): PanelDocument {
  const d = doc.device;
  if (d.preset === device.preset && d.widthPx === device.widthPx && d.heightPx === device.heightPx && d.orientation === device.orientation) return doc;
  return { ...doc, device: { ...device } };
}

/**
 * Changes the grid. When it shrinks, every tile on every page is shrunk (not below its kind's minimum
 * unless the grid itself is smaller) and moved to stay inside.
 */
export function setGrid(doc: PanelDocument, grid: Grid, minSizeOf: MinSizeOf = ONE_CELL): PanelDocument {
  const g = doc.grid;
  if (g.columns === grid.columns && g.rows === grid.rows && g.gapPx === grid.gapPx) return doc;
  return {
    ...doc,
    grid: { ...grid },
    pages: doc.pages.map((p) => ({ ...p, tiles: p.tiles.map((t) => placed(t, clampRect(t, grid, minSizeOf(t.kind)))) })),
  };
}

/** Sets one named colour of the theme (`#rrggbb`, validated by the caller). */
export function setThemeColour(doc: PanelDocument, name: ThemeColour, hex: string): PanelDocument {
  if (doc.theme[name] === hex) return doc;
  return { ...doc, theme: { ...doc.theme, [name]: hex } };
}

/** Replaces the whole theme. */
export function setTheme(doc: PanelDocument, theme: Theme): PanelDocument {
  return { ...doc, theme: { ...theme } };
}

/**
 * The first free spot, scanning rows top to bottom and cells left to right, where a `size` tile overlaps no
 * tile of the page; the top-left cell when the page is full. For adding a tile without a drop position.
 */
export function firstFreeCell(doc: PanelDocument, pageId: string, size: CellSize): Cell {
  const tiles = findPage(doc, pageId)?.tiles ?? [];
  const w = Math.min(size.w, doc.grid.columns);
  const h = Math.min(size.h, doc.grid.rows);
  for (let y = 0; y + h <= doc.grid.rows; y += 1) {
    for (let x = 0; x + w <= doc.grid.columns; x += 1) {
      if (!tiles.some((t) => x < t.x + t.w && t.x < x + w && y < t.y + t.h && t.y < y + h)) return { x, y };
    }
  }
  return { x: 0, y: 0 };
}
