// Pure: the designer's state and reducer. Every edit goes through a layout operation from
// shared/domain/panels/layout.ts and lands in the undo history; the selection and page follow along.
import {
  addPage,
  addTile,
  alignTiles,
  deletePage,
  deleteTiles,
  distributeTiles,
  duplicateTiles,
  findPage,
  firstFreeCell,
  movePage,
  moveTiles,
  renamePage,
  resizeTile,
  setDevice,
  setGrid,
  setThemeColour,
  setTileRect,
  updateTile,
  type AlignEdge,
  type Cell,
  type CellRect,
  type ResizeHandle,
} from '../../../../shared/domain/panels/layout';
import { createHistory, push, redo, resetHistory, seal, undo, type History } from '../../../../shared/domain/panels/history';
import { TILE_CATALOGUE } from '../../../../shared/domain/panels/tile-catalogue';
import type { Device, Grid, PanelDocument, ThemeColour, Tile, TileKind } from '../../../../shared/schemas/panel';

export const minSizeOf = (kind: TileKind) => TILE_CATALOGUE[kind].minSize;

export type EditorState = {
  history: History<PanelDocument>;
  pageId: string;
  /** Selected tile ids on the current page, in the order they were picked. */
  selection: readonly string[];
  /** The version the working copy is based on: the `baseVersionId` of the next save. */
  baseVersionId: string;
  /** The document of that version, to tell whether there are unsaved changes. */
  savedDocument: PanelDocument;
};

export type EditorAction =
  | { type: 'load'; document: PanelDocument; versionId: string }
  | { type: 'saved'; document: PanelDocument; versionId: string }
  /** Keep the working copy but base it on `versionId` (the conflict's "keep mine": the next save goes on top). */
  | { type: 'rebase'; versionId: string; document: PanelDocument }
  /** Load a document as the working copy (restore a version, "load theirs"); undoable. */
  | { type: 'replace-document'; document: PanelDocument }
  | { type: 'add-tile'; kind: TileKind; id: string; at?: Cell }
  | { type: 'move-selection'; dx: number; dy: number }
  | { type: 'move-tiles'; ids: readonly string[]; dx: number; dy: number }
  | { type: 'resize-tile'; tileId: string; handle: ResizeHandle; dx: number; dy: number }
  | { type: 'set-tile-rect'; tileId: string; rect: CellRect }
  | { type: 'align'; edge: AlignEdge }
  | { type: 'distribute'; axis: 'horizontal' | 'vertical' }
  /** `ids`: one new id per selected tile. */
  | { type: 'duplicate'; ids: readonly string[] }
  | { type: 'delete-selection' }
  | { type: 'select'; ids: readonly string[]; mode: 'replace' | 'toggle' | 'add' }
  | { type: 'select-all' }
  | { type: 'clear-selection' }
  /** A property edit; edits with the same `coalesceKey` in a row undo as one (one field being typed in). */
  | { type: 'update-tile'; tileId: string; patch: Record<string, unknown>; coalesceKey?: string }
  | { type: 'set-page'; pageId: string }
  | { type: 'add-page'; id: string; name: string }
  | { type: 'rename-page'; pageId: string; name: string }
  | { type: 'delete-page'; pageId: string }
  | { type: 'move-page'; pageId: string; toIndex: number }
  | { type: 'set-device'; device: Device }
  | { type: 'set-grid'; grid: Grid }
  | { type: 'set-theme-colour'; name: ThemeColour; hex: string; coalesceKey?: string }
  | { type: 'undo' }
  | { type: 'redo' }
  /** Closes a coalesced step (a field lost focus). */
  | { type: 'seal' };

export function initialEditorState(document: PanelDocument, versionId: string): EditorState {
  return { history: createHistory(document), pageId: document.pages[0]!.id, selection: [], baseVersionId: versionId, savedDocument: document };
}

export const currentDocument = (s: EditorState): PanelDocument => s.history.present;
export const currentPage = (s: EditorState) => findPage(s.history.present, s.pageId) ?? s.history.present.pages[0]!;

/** The selected tiles of the current page, in page order. */
export function selectedTiles(s: EditorState): Tile[] {
  return currentPage(s).tiles.filter((t) => s.selection.includes(t.id));
}

/** Whether the working copy differs from the version it is based on. */
export function isDirty(s: EditorState): boolean {
  const doc = s.history.present;
  return doc !== s.savedDocument && JSON.stringify(doc) !== JSON.stringify(s.savedDocument);
}

/** After the document changed under it (undo, a deleted page), keep the page and selection valid. */
function settle(s: EditorState): EditorState {
  const doc = s.history.present;
  const page = findPage(doc, s.pageId) ?? doc.pages[0]!;
  const selection = s.selection.filter((id) => page.tiles.some((t) => t.id === id));
  if (page.id === s.pageId && selection.length === s.selection.length) return s;
  return { ...s, pageId: page.id, selection };
}

function edit(s: EditorState, next: PanelDocument, coalesceKey: string | null = null, selection = s.selection): EditorState {
  if (next === s.history.present && selection === s.selection) return s;
  return settle({ ...s, history: push(s.history, next, coalesceKey), selection });
}

export function editorReducer(s: EditorState, a: EditorAction): EditorState {
  const doc = s.history.present;
  const pageId = currentPage(s).id;
  switch (a.type) {
    case 'load':
      return { history: resetHistory(s.history, a.document), pageId: a.document.pages[0]!.id, selection: [], baseVersionId: a.versionId, savedDocument: a.document };
    case 'saved':
      return { ...s, history: seal(s.history), baseVersionId: a.versionId, savedDocument: a.document };
    case 'rebase':
      return { ...s, baseVersionId: a.versionId, savedDocument: a.document };
    case 'replace-document':
      return edit({ ...s, history: seal(s.history) }, a.document);
    case 'add-tile': {
      const entry = TILE_CATALOGUE[a.kind];
      const at = a.at ?? firstFreeCell(doc, pageId, entry.defaultSize);
      const next = addTile(doc, pageId, entry.create(a.id, at, doc.theme), minSizeOf);
      return next === doc ? s : edit(s, next, null, [a.id]);
    }
    case 'move-selection':
      return edit(s, moveTiles(doc, pageId, s.selection, a.dx, a.dy));
    case 'move-tiles':
      return edit(s, moveTiles(doc, pageId, a.ids, a.dx, a.dy));
    case 'resize-tile':
      return edit(s, resizeTile(doc, pageId, a.tileId, a.handle, a.dx, a.dy, minSizeOf));
    case 'set-tile-rect':
      return edit(s, setTileRect(doc, pageId, a.tileId, a.rect, minSizeOf));
    case 'align':
      return edit(s, alignTiles(doc, pageId, s.selection, a.edge));
    case 'distribute':
      return edit(s, distributeTiles(doc, pageId, s.selection, a.axis));
    case 'duplicate': {
      let i = 0;
      const result = duplicateTiles(doc, pageId, s.selection, () => a.ids[i++] ?? `${a.ids[0]}-${i}`);
      return result.ids.length === 0 ? s : edit(s, result.doc, null, result.ids);
    }
    case 'delete-selection':
      return s.selection.length === 0 ? s : edit(s, deleteTiles(doc, pageId, s.selection), null, []);
    case 'select': {
      const onPage = a.ids.filter((id) => currentPage(s).tiles.some((t) => t.id === id));
      if (a.mode === 'replace') return { ...s, selection: onPage };
      if (a.mode === 'add') return { ...s, selection: [...s.selection, ...onPage.filter((id) => !s.selection.includes(id))] };
      const toggled = onPage.reduce<readonly string[]>((sel, id) => (sel.includes(id) ? sel.filter((x) => x !== id) : [...sel, id]), s.selection);
      return { ...s, selection: toggled };
    }
    case 'select-all':
      return { ...s, selection: currentPage(s).tiles.map((t) => t.id) };
    case 'clear-selection':
      return s.selection.length === 0 ? s : { ...s, selection: [] };
    case 'update-tile':
      return edit(s, updateTile(doc, pageId, a.tileId, a.patch, minSizeOf), a.coalesceKey ? `tile:${a.tileId}:${a.coalesceKey}` : null);
    case 'set-page':
      return findPage(doc, a.pageId) && a.pageId !== s.pageId ? { ...s, pageId: a.pageId, selection: [] } : s;
    case 'add-page': {
      const next = addPage(doc, { id: a.id, name: a.name });
      return next === doc ? s : { ...edit(s, next, null, []), pageId: a.id };
    }
    case 'rename-page':
      return edit(s, renamePage(doc, a.pageId, a.name));
    case 'delete-page':
      return edit(s, deletePage(doc, a.pageId));
    case 'move-page':
      return edit(s, movePage(doc, a.pageId, a.toIndex));
    case 'set-device':
      return edit(s, setDevice(doc, a.device));
    case 'set-grid':
      return edit(s, setGrid(doc, a.grid, minSizeOf));
    case 'set-theme-colour':
      return edit(s, setThemeColour(doc, a.name, a.hex), a.coalesceKey ? `theme:${a.name}:${a.coalesceKey}` : null);
    case 'undo':
      return settle({ ...s, history: undo(s.history) });
    case 'redo':
      return settle({ ...s, history: redo(s.history) });
    case 'seal':
      return { ...s, history: seal(s.history) };
  }
}
