import { max, mean, min, sum } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { panelDocumentSchema, type PanelDocument, type Tile } from '../../schemas/panel';
import {
  addPage,
  addTile,
  alignTiles,
  clampRect,
  deletePage,
  deleteTiles,
  distributeTiles,
  duplicateTiles,
  findTile,
  firstFreeCell,
  groupOffset,
  movePage,
  moveTile,
  moveTiles,
  renamePage,
  resizedRect,
  resizeTile,
  setDevice,
  setGrid,
  setThemeColour,
  snapOffset,
  updateTile,
} from './layout';

// A small panel of the demo team (Harborlight Robotics, robot Gullwing): 12 × 8 cells on a 1280 × 800 tablet.
function makePanel(tiles: Tile[] = []): PanelDocument {
  return panelDocumentSchema.parse({
    device: { preset: 'tablet-1280x800', widthPx: 1280, heightPx: 800, orientation: 'landscape' },
    grid: { columns: 12, rows: 8, gapPx: 8 },
    theme: {
      canvas: '#101418',
      surface: '#1d2228',
      text: '#eef1f4',
      accent: '#f5a30f',
      accentText: '#0c0e10',
      ok: '#2fbf8f',
      warn: '#ffbb3d',
      danger: '#ff7a59',
      muted: '#8893a0',
    },
    pages: [{ id: 'match', name: 'Match', tiles }],
  });
}

const pad = (id: string, x: number, y: number, w = 2, h = 2): Tile => ({
  id,
  kind: 'push-pad',
  x,
  y,
  w,
  h,
  label: `Pad ${id}`,
  fill: 'surface',
  ink: 'text',
  channel: `op/pad/${id}`,
});

const rectOf = (doc: PanelDocument, id: string) => {
  const t = findTile(doc, 'match', id)!;
  return { x: t.x, y: t.y, w: t.w, h: t.h };
};

describe('clampRect', () => {
  it.each([
    [{ x: -3, y: 2, w: 2, h: 2 }, { x: 0, y: 2, w: 2, h: 2 }],
    [{ x: 11, y: 7, w: 3, h: 3 }, { x: 9, y: 5, w: 3, h: 3 }],
    [{ x: 0, y: 0, w: 40, h: 1 }, { x: 0, y: 0, w: 12, h: 1 }],
    [{ x: 2.4, y: 1.6, w: 1.5, h: 2.49 }, { x: 2, y: 2, w: 2, h: 2 }],
  ])('fits %o into the 12 × 8 grid as %o', (rect, expected) => {
    expect(clampRect(rect, { columns: 12, rows: 8 })).toEqual(expected);
  });

  it('grows a rectangle to the minimum size but never past the grid', () => {
    expect(clampRect({ x: 5, y: 5, w: 1, h: 1 }, { columns: 12, rows: 8 }, { w: 4, h: 4 })).toEqual({ x: 5, y: 4, w: 4, h: 4 });
    expect(clampRect({ x: 0, y: 0, w: 1, h: 1 }, { columns: 3, rows: 3 }, { w: 4, h: 4 })).toEqual({ x: 0, y: 0, w: 3, h: 3 });
  });
});

describe('snapOffset', () => {
  it('rounds a pointer offset to the nearest whole cell, with no negative zero', () => {
    // 1280 / 12 columns ≈ 106.67 px per cell, 800 / 8 rows = 100 px per cell.
    expect(snapOffset(160, -49, 1280 / 12, 100)).toEqual({ dx: 2, dy: 0 });
    expect(Object.is(snapOffset(-10, -10, 100, 100).dx, -0)).toBe(false);
    expect(snapOffset(-151, 250, 100, 100)).toEqual({ dx: -2, dy: 3 });
  });
});

describe('addTile', () => {
  it('adds a tile inside the grid without touching the input document', () => {
    const doc = makePanel();
    const next = addTile(doc, 'match', pad('a', 11, 7, 3, 2));
    expect(rectOf(next, 'a')).toEqual({ x: 9, y: 6, w: 3, h: 2 });
    expect(doc.pages[0]!.tiles).toHaveLength(0);
    expect(panelDocumentSchema.safeParse(next).success).toBe(true);
  });

  it('raises a tile to its kind’s minimum size', () => {
    const next = addTile(makePanel(), 'match', pad('a', 0, 0, 1, 1), () => ({ w: 2, h: 3 }));
    expect(rectOf(next, 'a')).toEqual({ x: 0, y: 0, w: 2, h: 3 });
  });

  it('refuses a second tile with the same id and an unknown page', () => {
    const doc = makePanel([pad('a', 0, 0)]);
    expect(addTile(doc, 'match', pad('a', 4, 4))).toBe(doc);
    expect(addTile(doc, 'nowhere', pad('b', 4, 4))).toBe(doc);
  });
});

describe('moveTile', () => {
  it('moves a tile and keeps it inside the grid', () => {
    const doc = makePanel([pad('a', 0, 0, 3, 2)]);
    expect(rectOf(moveTile(doc, 'match', 'a', { x: 4, y: 3 }), 'a')).toEqual({ x: 4, y: 3, w: 3, h: 2 });
    expect(rectOf(moveTile(doc, 'match', 'a', { x: 20, y: -5 }), 'a')).toEqual({ x: 9, y: 0, w: 3, h: 2 });
  });

  it('returns the same document when the tile stays where it is', () => {
    const doc = makePanel([pad('a', 0, 0)]);
    expect(moveTile(doc, 'match', 'a', { x: 0, y: -4 })).toBe(doc);
  });
});

describe('moveTiles', () => {
  it('moves a selection together and keeps its shape at the grid edge', () => {
    const doc = makePanel([pad('a', 1, 1), pad('b', 6, 3), pad('c', 0, 6)]);
    // b's right edge is at 8, so the group may move at most 4 cells right.
    expect(groupOffset(doc, 'match', ['a', 'b'], 10, 0)).toEqual({ dx: 4, dy: 0 });
    const next = moveTiles(doc, 'match', ['a', 'b'], 10, -3);
    expect(rectOf(next, 'a')).toEqual({ x: 5, y: 0, w: 2, h: 2 });
    expect(rectOf(next, 'b')).toEqual({ x: 10, y: 2, w: 2, h: 2 });
    expect(rectOf(next, 'c')).toEqual({ x: 0, y: 6, w: 2, h: 2 });
    expect(next.pages[0]!.tiles[2]).toBe(doc.pages[0]!.tiles[2]);
  });

  it('does nothing when the group already touches the edge it is pushed against', () => {
    const doc = makePanel([pad('a', 0, 0)]);
    expect(moveTiles(doc, 'match', ['a'], -1, 0)).toBe(doc);
  });
});

describe('resizedRect', () => {
  const grid = { columns: 12, rows: 8 };
  it.each([
    ['se', 2, 1, { x: 2, y: 2, w: 5, h: 4 }],
    ['nw', -1, -1, { x: 1, y: 1, w: 4, h: 4 }],
    ['e', -10, 0, { x: 2, y: 2, w: 2, h: 3 }],
    ['n', 0, 10, { x: 2, y: 3, w: 3, h: 2 }],
    ['s', 0, 10, { x: 2, y: 2, w: 3, h: 6 }],
    ['w', -10, 0, { x: 0, y: 2, w: 5, h: 3 }],
  ] as const)('dragging %s by (%i, %i) gives %o, keeping the opposite edge and a 2 × 2 minimum', (handle, dx, dy, expected) => {
    expect(resizedRect({ x: 2, y: 2, w: 3, h: 3 }, handle, dx, dy, grid, { w: 2, h: 2 })).toEqual(expected);
  });

  it('resizeTile uses the kind’s minimum size', () => {
    const doc = makePanel([pad('a', 2, 2, 4, 4)]);
    const next = resizeTile(doc, 'match', 'a', 'se', -5, -5, () => ({ w: 3, h: 2 }));
    expect(rectOf(next, 'a')).toEqual({ x: 2, y: 2, w: 3, h: 2 });
  });
});

describe('alignTiles', () => {
  const doc = makePanel([pad('a', 1, 1, 2, 2), pad('b', 5, 3, 3, 1), pad('c', 3, 5, 1, 3)]);
  it.each([
    ['left', { a: 1, b: 1, c: 1 }, 'x'],
    ['right', { a: 6, b: 5, c: 7 }, 'x'],
    ['top', { a: 1, b: 1, c: 1 }, 'y'],
    ['bottom', { a: 6, b: 7, c: 5 }, 'y'],
    // Box 1 … 8 horizontally: centre 4.5; a (w 2) starts at floor((1 + 8 − 2) / 2) = 3.
    ['centre-x', { a: 3, b: 3, c: 4 }, 'x'],
    // Box 1 … 8 vertically: b (h 1) starts at floor((1 + 8 − 1) / 2) = 4.
    ['centre-y', { a: 3, b: 4, c: 3 }, 'y'],
  ] as const)('%s lines the selection up on its bounding box', (edge, expected, axis) => {
    const next = alignTiles(doc, 'match', ['a', 'b', 'c'], edge);
    for (const [id, v] of Object.entries(expected)) expect(findTile(next, 'match', id)![axis]).toBe(v);
  });

  it('needs two tiles', () => {
    expect(alignTiles(doc, 'match', ['a'], 'left')).toBe(doc);
  });
});

describe('distributeTiles', () => {
  it('makes the gaps equal, keeping the first and last tile', () => {
    const doc = makePanel([pad('a', 0, 0, 2, 1), pad('b', 2, 0, 2, 1), pad('c', 10, 0, 2, 1)]);
    const next = distributeTiles(doc, 'match', ['c', 'a', 'b'], 'horizontal');
    // Span 0 … 12 holds 6 cells of tiles and 6 free: two gaps of 3.
    expect([rectOf(next, 'a').x, rectOf(next, 'b').x, rectOf(next, 'c').x]).toEqual([0, 5, 10]);
  });

  it('gives a remainder to the first gaps, one cell each', () => {
    const doc = makePanel([pad('a', 0, 0, 1, 1), pad('b', 0, 1, 1, 1), pad('c', 0, 2, 1, 1), pad('d', 0, 7, 1, 1)]);
    // Span 0 … 8 holds 4 cells of tiles and 4 free cells over 3 gaps: 2, 1, 1.
    const next = distributeTiles(doc, 'match', ['a', 'b', 'c', 'd'], 'vertical');
    expect(['a', 'b', 'c', 'd'].map((id) => rectOf(next, id).y)).toEqual([0, 3, 5, 7]);
  });

  it('leaves gaps that differ by at most one cell and add up to the free span (checked with simple-statistics)', () => {
    const doc = makePanel([pad('a', 0, 0, 1, 1), pad('b', 1, 0, 2, 1), pad('c', 3, 0, 1, 1), pad('d', 4, 0, 1, 1), pad('e', 11, 0, 1, 1)]);
    const next = distributeTiles(doc, 'match', ['a', 'b', 'c', 'd', 'e'], 'horizontal');
    const rects = ['a', 'b', 'c', 'd', 'e'].map((id) => rectOf(next, id));
    const gaps = rects.slice(1).map((r, i) => r.x - (rects[i]!.x + rects[i]!.w));
    // Span 0 … 12 holds 6 cells of tiles: 6 free cells over 4 gaps, so a mean gap of 1.5 cells.
    expect(sum(gaps)).toBe(6);
    expect(mean(gaps)).toBeCloseTo(1.5);
    expect(max(gaps) - min(gaps)).toBeLessThanOrEqual(1);
  });

  it('needs three tiles', () => {
    const doc = makePanel([pad('a', 0, 0), pad('b', 5, 0)]);
    expect(distributeTiles(doc, 'match', ['a', 'b'], 'horizontal')).toBe(doc);
  });
});

describe('duplicateTiles', () => {
  it('copies with new ids, offset by one cell, and returns the copies as the new selection', () => {
    const doc = makePanel([pad('a', 1, 1), pad('b', 4, 1)]);
    let n = 0;
    const { doc: next, ids } = duplicateTiles(doc, 'match', ['a', 'b'], () => `copy-${++n}`);
    expect(ids).toEqual(['copy-1', 'copy-2']);
    expect(rectOf(next, 'copy-1')).toEqual({ x: 2, y: 2, w: 2, h: 2 });
    expect(findTile(next, 'match', 'copy-2')).toMatchObject({ kind: 'push-pad', channel: 'op/pad/b', x: 5, y: 2 });
    expect(next.pages[0]!.tiles).toHaveLength(4);
  });

  it('keeps the copies inside the grid at the bottom-right corner', () => {
    const doc = makePanel([pad('a', 10, 6)]);
    const { doc: next, ids } = duplicateTiles(doc, 'match', ['a'], () => 'a2');
    expect(ids).toEqual(['a2']);
    expect(rectOf(next, 'a2')).toEqual({ x: 10, y: 6, w: 2, h: 2 });
  });
});

describe('deleteTiles', () => {
  it('removes only the named tiles', () => {
    const doc = makePanel([pad('a', 0, 0), pad('b', 3, 0), pad('c', 6, 0)]);
    const next = deleteTiles(doc, 'match', ['a', 'c']);
    expect(next.pages[0]!.tiles.map((t) => t.id)).toEqual(['b']);
    expect(deleteTiles(doc, 'match', ['zz'])).toBe(doc);
  });
});

describe('updateTile', () => {
  it('changes properties but never the id or kind', () => {
    const doc = makePanel([pad('a', 0, 0)]);
    const next = updateTile(doc, 'match', 'a', { label: 'Climb', channel: 'op/climb', id: 'x', kind: 'lamp' } as never);
    expect(findTile(next, 'match', 'a')).toMatchObject({ id: 'a', kind: 'push-pad', label: 'Climb', channel: 'op/climb' });
  });

  it('returns the same document for an edit that changes nothing', () => {
    const doc = makePanel([pad('a', 0, 0)]);
    expect(updateTile(doc, 'match', 'a', { label: 'Pad a' })).toBe(doc);
  });
});

describe('pages', () => {
  it('adds, renames, reorders and deletes pages, keeping at least one', () => {
    let doc = makePanel([pad('a', 0, 0)]);
    doc = addPage(doc, { id: 'pit', name: 'Pit checks' });
    doc = addPage(doc, { id: 'auto', name: '  ' });
    expect(doc.pages.map((p) => p.name)).toEqual(['Match', 'Pit checks', 'Page 3']);
    doc = renamePage(doc, 'auto', 'Auto routine');
    expect(renamePage(doc, 'auto', '   ')).toBe(doc);
    doc = movePage(doc, 'auto', 0);
    expect(doc.pages.map((p) => p.id)).toEqual(['auto', 'match', 'pit']);
    doc = deletePage(doc, 'match');
    doc = deletePage(doc, 'pit');
    expect(doc.pages.map((p) => p.id)).toEqual(['auto']);
    expect(deletePage(doc, 'auto')).toBe(doc);
  });

  it('stops at eight pages', () => {
    let doc = makePanel();
    for (let i = 0; i < 10; i += 1) doc = addPage(doc, { id: `p${i}`, name: `P${i}` });
    expect(doc.pages).toHaveLength(8);
  });
});

describe('setGrid', () => {
  it('shrinks and moves tiles into a smaller grid', () => {
    const doc = makePanel([pad('a', 9, 6, 3, 2), pad('b', 0, 0, 12, 1)]);
    const next = setGrid(doc, { columns: 8, rows: 6, gapPx: 4 });
    expect(rectOf(next, 'a')).toEqual({ x: 5, y: 4, w: 3, h: 2 });
    expect(rectOf(next, 'b')).toEqual({ x: 0, y: 0, w: 8, h: 1 });
    expect(panelDocumentSchema.safeParse(next).success).toBe(true);
  });
});

describe('setDevice and setThemeColour', () => {
  it('change the device and a theme colour, and return the same document when nothing changes', () => {
    const doc = makePanel();
    expect(setDevice(doc, { ...doc.device })).toBe(doc);
    expect(setDevice(doc, { ...doc.device, orientation: 'portrait' }).device.orientation).toBe('portrait');
    expect(setThemeColour(doc, 'accent', '#f5a30f')).toBe(doc);
    expect(setThemeColour(doc, 'accent', '#0072b2').theme.accent).toBe('#0072b2');
  });
});

describe('firstFreeCell', () => {
  it('finds the first spot where a tile of the size overlaps nothing', () => {
    const doc = makePanel([pad('a', 0, 0, 4, 2), pad('b', 6, 0, 2, 3)]);
    expect(firstFreeCell(doc, 'match', { w: 2, h: 2 })).toEqual({ x: 4, y: 0 });
    expect(firstFreeCell(doc, 'match', { w: 3, h: 2 })).toEqual({ x: 8, y: 0 });
    expect(firstFreeCell(doc, 'match', { w: 12, h: 2 })).toEqual({ x: 0, y: 3 });
  });
});
