// Pure: imports only shared files. What changed between two versions of a panel document: tiles added,
// removed, moved, resized and changed (with the fields), pages added, removed and renamed, and the device,
// grid and theme; plus the change as short human lines for the version history.
//
// Tiles are matched by page id and tile id. A tile whose kind changed, or that went to another page, is
// removed from its old place and added at its new one.
import type { Device, Grid, Page, PanelDocument, ThemeColour, Tile } from '../../schemas/panel';
import { THEME_COLOURS } from '../../schemas/panel';
import { deviceSize } from './grid';
import { THEME_COLOUR_NAMES, TILE_CATALOGUE } from './tile-catalogue';

export type TileRef = { pageId: string; pageName: string; tileId: string; kind: Tile['kind']; label: string };
export type TileMove = TileRef & { from: { x: number; y: number }; to: { x: number; y: number } };
export type TileResize = TileRef & { from: { w: number; h: number }; to: { w: number; h: number } };
/** `fields` are the tile's property names that differ, e.g. `label`, `channel`, `options`; `labelBefore` when the label changed. */
export type TileChange = TileRef & { fields: string[]; labelBefore?: string };
export type PageRef = { pageId: string; name: string };

export type PanelDiff = {
  added: (TileRef & { at: { x: number; y: number } })[];
  removed: TileRef[];
  moved: TileMove[];
  resized: TileResize[];
  changed: TileChange[];
  pagesAdded: PageRef[];
  pagesRemoved: PageRef[];
  pagesRenamed: { pageId: string; from: string; to: string }[];
  /** The pages that stayed are in another order. */
  pagesReordered: boolean;
  device: { from: Device; to: Device } | null;
  grid: { from: Grid; to: Grid } | null;
  theme: { colour: ThemeColour; from: string; to: string }[];
};

const PLACEMENT = new Set(['id', 'kind', 'x', 'y', 'w', 'h']);

/** Whether two JSON-like values are equal (key order ignored). */
function sameValue(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((v, i) => sameValue(v, b[i]));
  const ka = Object.keys(a as object);
  const kb = Object.keys(b as object);
  return ka.length === kb.length && ka.every((k) => Object.hasOwn(b as object, k) && sameValue((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]));
}

function ref(page: Page, tile: Tile): TileRef {
  return { pageId: page.id, pageName: page.name, tileId: tile.id, kind: tile.kind, label: tile.label };
}

/** The differences from `before` to `after`. */
export function diffDocuments(before: PanelDocument, after: PanelDocument): PanelDiff {
  const diff: PanelDiff = {
    added: [],
    removed: [],
    moved: [],
    resized: [],
    changed: [],
    pagesAdded: [],
    pagesRemoved: [],
    pagesRenamed: [],
    pagesReordered: false,
    device: sameValue(before.device, after.device) ? null : { from: before.device, to: after.device },
    grid: sameValue(before.grid, after.grid) ? null : { from: before.grid, to: after.grid },
    theme: THEME_COLOURS.filter((c) => before.theme[c].toLowerCase() !== after.theme[c].toLowerCase()).map((colour) => ({
      colour,
      from: before.theme[colour],
      to: after.theme[colour],
    })),
  };
  const beforePages = new Map(before.pages.map((p) => [p.id, p]));
  const afterPages = new Map(after.pages.map((p) => [p.id, p]));

  for (const page of before.pages) {
    if (!afterPages.has(page.id)) {
      diff.pagesRemoved.push({ pageId: page.id, name: page.name });
      for (const tile of page.tiles) diff.removed.push(ref(page, tile));
    }
  }
  const keptBefore = before.pages.filter((p) => afterPages.has(p.id)).map((p) => p.id);
  const keptAfter = after.pages.filter((p) => beforePages.has(p.id)).map((p) => p.id);
  diff.pagesReordered = keptBefore.some((id, i) => keptAfter[i] !== id);

  for (const page of after.pages) {
    const old = beforePages.get(page.id);
    if (!old) {
      diff.pagesAdded.push({ pageId: page.id, name: page.name });
      for (const tile of page.tiles) diff.added.push({ ...ref(page, tile), at: { x: tile.x, y: tile.y } });
      continue;
    }
    if (old.name !== page.name) diff.pagesRenamed.push({ pageId: page.id, from: old.name, to: page.name });
    const oldTiles = new Map(old.tiles.map((t) => [t.id, t]));
    const newIds = new Set(page.tiles.filter((t) => oldTiles.get(t.id)?.kind === t.kind).map((t) => t.id));
    for (const tile of old.tiles) if (!newIds.has(tile.id)) diff.removed.push(ref(old, tile));
    for (const tile of page.tiles) {
      const was = oldTiles.get(tile.id);
      if (!was || was.kind !== tile.kind) {
        diff.added.push({ ...ref(page, tile), at: { x: tile.x, y: tile.y } });
        continue;
      }
      const here = ref(page, tile);
      if (was.x !== tile.x || was.y !== tile.y) diff.moved.push({ ...here, from: { x: was.x, y: was.y }, to: { x: tile.x, y: tile.y } });
      if (was.w !== tile.w || was.h !== tile.h) diff.resized.push({ ...here, from: { w: was.w, h: was.h }, to: { w: tile.w, h: tile.h } });
      const keys = [...new Set([...Object.keys(was), ...Object.keys(tile)])].filter((k) => !PLACEMENT.has(k));
      const fields = keys.filter((k) => !sameValue((was as Record<string, unknown>)[k], (tile as Record<string, unknown>)[k]));
      if (fields.length > 0) diff.changed.push({ ...here, fields, ...(fields.includes('label') ? { labelBefore: was.label } : {}) });
    }
  }
  return diff;
}

/** Whether the diff holds no change at all. */
export function isEmptyDiff(diff: PanelDiff): boolean {
  return (
    diff.added.length + diff.removed.length + diff.moved.length + diff.resized.length + diff.changed.length === 0 &&
    diff.pagesAdded.length + diff.pagesRemoved.length + diff.pagesRenamed.length + diff.theme.length === 0 &&
    !diff.pagesReordered &&
    diff.device === null &&
    diff.grid === null
  );
}

function name(tile: TileRef, label = tile.label): string {
  const kind = TILE_CATALOGUE[tile.kind].label.toLowerCase();
  return label.trim() === '' ? `a ${kind}` : `‘${label}’`;
}

function kindAfter(tile: TileRef): string {
  return tile.label.trim() === '' ? '' : ` (${TILE_CATALOGUE[tile.kind].label.toLowerCase()})`;
}

function describeDevice(device: Device): string {
  const screen = deviceSize(device);
  return `${screen.widthPx} × ${screen.heightPx} ${device.orientation}`;
}

function describeGrid(grid: Grid): string {
  return `${grid.columns} × ${grid.rows} cells, ${grid.gapPx} px gap`;
}

const FIELD_NAMES: Record<string, string> = {
  label: 'label',
  fill: 'fill colour',
  ink: 'text colour',
  channel: 'channel',
  channels: 'channels',
  options: 'options',
  labelScheme: 'face labels',
  orientation: 'orientation',
  onColour: 'on colour',
  offColour: 'off colour',
  unit: 'unit',
  decimals: 'decimals',
  thresholds: 'thresholds',
  text: 'text',
  size: 'text size',
};

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * The diff as short lines, pages first, then tiles (added, removed, moved, resized, changed), then the
 * device, grid and theme, e.g. "Moved ‘Level’ from (3,1) to (5,1)". Positions are grid cells (column, row)
 * from 0 at the top-left. Tiles name their page when either version has more than one. Empty for no change.
 */
export function summarizeDiff(diff: PanelDiff, options: { showPages?: boolean } = {}): string[] {
  const tilePageIds = new Set([...diff.added, ...diff.removed, ...diff.moved, ...diff.resized, ...diff.changed].map((t) => t.pageId));
  const showPages = options.showPages ?? (tilePageIds.size > 1 || diff.pagesAdded.length + diff.pagesRemoved.length > 0);
  const onPage = (t: TileRef) => (showPages ? ` on ‘${t.pageName}’` : '');
  const lines: string[] = [];
  for (const p of diff.pagesAdded) lines.push(`Added page ‘${p.name}’`);
  for (const p of diff.pagesRemoved) lines.push(`Removed page ‘${p.name}’`);
  for (const p of diff.pagesRenamed) lines.push(`Renamed page ‘${p.from}’ to ‘${p.to}’`);
  if (diff.pagesReordered) lines.push('Reordered the pages');
  for (const t of diff.added) lines.push(`Added ${name(t)}${kindAfter(t)} at (${t.at.x},${t.at.y})${onPage(t)}`);
  for (const t of diff.removed) lines.push(`Removed ${name(t)}${kindAfter(t)}${onPage(t)}`);
  for (const t of diff.moved) lines.push(`Moved ${name(t)} from (${t.from.x},${t.from.y}) to (${t.to.x},${t.to.y})${onPage(t)}`);
  for (const t of diff.resized) lines.push(`Resized ${name(t)} from ${t.from.w} × ${t.from.h} to ${t.to.w} × ${t.to.h}${onPage(t)}`);
  for (const t of diff.changed) {
    const rest = t.fields.filter((f) => f !== 'label').map((f) => FIELD_NAMES[f] ?? f);
    if (t.labelBefore !== undefined) {
      const kind = TILE_CATALOGUE[t.kind].label.toLowerCase();
      if (t.label.trim() === '') lines.push(`Cleared the label of ‘${t.labelBefore}’ (${kind})${onPage(t)}`);
      else if (t.labelBefore.trim() === '') lines.push(`Labelled a ${kind} ‘${t.label}’${onPage(t)}`);
      else lines.push(`Renamed ${name(t, t.labelBefore)} to ${name(t)}${onPage(t)}`);
    }
    if (rest.length > 0) lines.push(`Changed ${name(t)}${kindAfter(t)}: ${rest.join(', ')}${onPage(t)}`);
  }
  if (diff.device) lines.push(`Device ${describeDevice(diff.device.from)} → ${describeDevice(diff.device.to)}`);
  if (diff.grid) lines.push(`Grid ${describeGrid(diff.grid.from)} → ${describeGrid(diff.grid.to)}`);
  for (const c of diff.theme) lines.push(`${capitalise(THEME_COLOUR_NAMES[c.colour])} colour ${c.from} → ${c.to}`);
  return lines;
}
