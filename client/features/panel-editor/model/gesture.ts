// Pure: the canvas's pointer gesture as a small state machine, idle → pointing → dragging | resizing → idle.
// Positions are device CSS px (the canvas's own pixels, already divided by its on-screen scale). The machine
// never edits the document: it answers with editor actions, and a drag commits once, on release.
import { findPage, findTile, groupOffset, resizedRect, snapOffset, type CellRect, type ResizeHandle } from '../../../../shared/domain/panels/layout';
import type { Page, PanelDocument } from '../../../../shared/schemas/panel';
import { minSizeOf, type EditorAction } from './editor-state';

export type GestureTarget = { kind: 'move'; tileId: string } | { kind: 'resize'; tileId: string; handle: ResizeHandle };

export type Gesture =
  | { phase: 'idle' }
  | { phase: 'pointing'; pointerId: number; target: GestureTarget; startXPx: number; startYPx: number; isToggle: boolean; wasSelected: boolean }
  | { phase: 'dragging'; pointerId: number; tileIds: readonly string[]; startXPx: number; startYPx: number; dxPx: number; dyPx: number }
  | { phase: 'resizing'; pointerId: number; tileId: string; handle: ResizeHandle; startXPx: number; startYPx: number; dxPx: number; dyPx: number }
  /** A press on the empty canvas: a selection rectangle; with Shift it adds to the selection. */
  | { phase: 'marquee'; pointerId: number; startXPx: number; startYPx: number; dxPx: number; dyPx: number; isAdding: boolean };

export const IDLE: Gesture = { phase: 'idle' };

/** A press moves less than this before it counts as a drag, so a tap on a tablet still selects. */
export const DRAG_THRESHOLD_PX = 4;

export type PointerInput = { pointerId: number; xPx: number; yPx: number };
export type CellPx = { widthPx: number; heightPx: number };
type Step = { gesture: Gesture; actions: EditorAction[] };

/** Pointer-down on a tile or a resize handle. A second pointer while one is down is ignored. */
export function pointerDown(g: Gesture, p: PointerInput & { target: GestureTarget; shiftKey: boolean }, selection: readonly string[]): Step {
  if (g.phase !== 'idle') return { gesture: g, actions: [] };
  const { tileId } = p.target;
  const wasSelected = selection.includes(tileId);
  const isToggle = p.target.kind === 'move' && p.shiftKey;
  const actions: EditorAction[] = isToggle
    ? [{ type: 'select', ids: [tileId], mode: 'toggle' }]
    : wasSelected
      ? []
      : [{ type: 'select', ids: [tileId], mode: 'replace' }];
  return {
    gesture: { phase: 'pointing', pointerId: p.pointerId, target: p.target, startXPx: p.xPx, startYPx: p.yPx, isToggle, wasSelected },
    actions,
  };
}

/** Pointer-down on the empty canvas: starts a selection rectangle (without Shift the selection clears). */
export function canvasPointerDown(g: Gesture, p: PointerInput & { shiftKey: boolean }): Step {
  if (g.phase !== 'idle') return { gesture: g, actions: [] };
  return {
    gesture: { phase: 'marquee', pointerId: p.pointerId, startXPx: p.xPx, startYPx: p.yPx, dxPx: 0, dyPx: 0, isAdding: p.shiftKey },
    actions: p.shiftKey ? [] : [{ type: 'clear-selection' }],
  };
}

/** The selection rectangle in device px, normalised to a positive size. */
export function marqueeRectPx(g: Gesture): { xPx: number; yPx: number; widthPx: number; heightPx: number } | null {
  if (g.phase !== 'marquee' || Math.hypot(g.dxPx, g.dyPx) < DRAG_THRESHOLD_PX) return null;
  return { xPx: Math.min(g.startXPx, g.startXPx + g.dxPx), yPx: Math.min(g.startYPx, g.startYPx + g.dyPx), widthPx: Math.abs(g.dxPx), heightPx: Math.abs(g.dyPx) };
}

/** The tiles of a page that a rectangle (device px) touches. */
export function tilesInRect(page: Page, rect: { xPx: number; yPx: number; widthPx: number; heightPx: number }, cell: CellPx): string[] {
  return page.tiles
    .filter((t) => {
      const left = t.x * cell.widthPx;
      const top = t.y * cell.heightPx;
      return left < rect.xPx + rect.widthPx && rect.xPx < left + t.w * cell.widthPx && top < rect.yPx + rect.heightPx && rect.yPx < top + t.h * cell.heightPx;
    })
    .map((t) => t.id);
}

/** Pointer-move: past the threshold a press becomes a drag (of the whole selection) or a resize. */
export function pointerMove(g: Gesture, p: PointerInput, selection: readonly string[]): Gesture {
  if (g.phase === 'idle' || g.pointerId !== p.pointerId) return g;
  const dxPx = p.xPx - g.startXPx;
  const dyPx = p.yPx - g.startYPx;
  if (g.phase === 'pointing') {
    // A shift-press only toggles the tile in or out of the selection; it never drags.
    if (g.isToggle || Math.hypot(dxPx, dyPx) < DRAG_THRESHOLD_PX) return g;
    const { target } = g;
    if (target.kind === 'resize') {
      return { phase: 'resizing', pointerId: g.pointerId, tileId: target.tileId, handle: target.handle, startXPx: g.startXPx, startYPx: g.startYPx, dxPx, dyPx };
    }
    const tileIds = selection.includes(target.tileId) ? selection : [target.tileId];
    return { phase: 'dragging', pointerId: g.pointerId, tileIds, startXPx: g.startXPx, startYPx: g.startYPx, dxPx, dyPx };
  }
  if (g.dxPx === dxPx && g.dyPx === dyPx) return g;
  return { ...g, dxPx, dyPx };
}

/** Pointer-up: a drag or resize commits as one action in whole cells; a plain click picks one tile of several; a rectangle selects what it touches. */
export function pointerUp(g: Gesture, p: Pick<PointerInput, 'pointerId'>, cell: CellPx, selection: readonly string[], page?: Page): Step {
  if (g.phase === 'idle' || g.pointerId !== p.pointerId) return { gesture: g, actions: [] };
  switch (g.phase) {
    case 'marquee': {
      const rect = marqueeRectPx(g);
      if (!rect || !page) return { gesture: IDLE, actions: [] };
      return { gesture: IDLE, actions: [{ type: 'select', ids: tilesInRect(page, rect, cell), mode: g.isAdding ? 'add' : 'replace' }] };
    }
    case 'pointing': {
      const isPickOne = !g.isToggle && g.target.kind === 'move' && g.wasSelected && selection.length > 1;
      return { gesture: IDLE, actions: isPickOne ? [{ type: 'select', ids: [g.target.tileId], mode: 'replace' }] : [] };
    }
    case 'dragging': {
      const { dx, dy } = snapOffset(g.dxPx, g.dyPx, cell.widthPx, cell.heightPx);
      return { gesture: IDLE, actions: dx === 0 && dy === 0 ? [] : [{ type: 'move-tiles', ids: g.tileIds, dx, dy }] };
    }
    case 'resizing': {
      const { dx, dy } = snapOffset(g.dxPx, g.dyPx, cell.widthPx, cell.heightPx);
      return { gesture: IDLE, actions: dx === 0 && dy === 0 ? [] : [{ type: 'resize-tile', tileId: g.tileId, handle: g.handle, dx, dy }] };
    }
  }
}

/** The pointer was lost (pointercancel, Escape): nothing is committed. */
export function pointerCancel(): Gesture {
  return IDLE;
}

/** What the canvas draws during a drag: the tiles following the pointer, and the cells they would land on. */
export type DragPreview = { tileIds: readonly string[]; dxPx: number; dyPx: number; dx: number; dy: number };

export function dragPreview(g: Gesture, cell: CellPx): DragPreview | null {
  if (g.phase !== 'dragging') return null;
  const { dx, dy } = snapOffset(g.dxPx, g.dyPx, cell.widthPx, cell.heightPx);
  return { tileIds: g.tileIds, dxPx: g.dxPx, dyPx: g.dyPx, dx, dy };
}

export type ResizePreview = { tileId: string; handle: ResizeHandle; dx: number; dy: number };

export function resizePreview(g: Gesture, cell: CellPx): ResizePreview | null {
  if (g.phase !== 'resizing') return null;
  const { dx, dy } = snapOffset(g.dxPx, g.dyPx, cell.widthPx, cell.heightPx);
  return { tileId: g.tileId, handle: g.handle, dx, dy };
}

/** Where the dragged tiles would land (whole cells, the group kept inside the grid): the canvas's drop outline. */
export function dropRects(doc: PanelDocument, pageId: string, preview: DragPreview): CellRect[] {
  const offset = groupOffset(doc, pageId, preview.tileIds, preview.dx, preview.dy);
  const page = findPage(doc, pageId);
  return (page?.tiles ?? []).filter((t) => preview.tileIds.includes(t.id)).map((t) => ({ x: t.x + offset.dx, y: t.y + offset.dy, w: t.w, h: t.h }));
}

/** The rectangle a resize would give (kept inside the grid and at least the kind's minimum size). */
export function resizeRect(doc: PanelDocument, pageId: string, preview: ResizePreview): CellRect | null {
  const tile = findTile(doc, pageId, preview.tileId);
  if (!tile) return null;
  return resizedRect(tile, preview.handle, preview.dx, preview.dy, doc.grid, minSizeOf(tile.kind));
}
