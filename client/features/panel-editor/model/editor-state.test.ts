import { describe, expect, it } from 'vitest';
import { findTile } from '../../../../shared/domain/panels/layout';
import { presetDevice, starterPanelDocument } from '../../../../shared/domain/panels/starter-panel';
import { TILE_CATALOGUE } from '../../../../shared/domain/panels/tile-catalogue';
import { currentDocument, currentPage, editorReducer, initialEditorState, isDirty, selectedTiles, type EditorAction, type EditorState } from './editor-state';

// The demo team's new panel: the 1280 × 800 tablet, landscape, 16 × 10 cells.
const start = () => initialEditorState(starterPanelDocument(presetDevice('tablet-1280x800')), 'v1');
const run = (s: EditorState, ...actions: EditorAction[]) => actions.reduce(editorReducer, s);
const tile = (s: EditorState, id: string) => findTile(currentDocument(s), s.pageId, id)!;

describe('editorReducer', () => {
  it('adds a tile from the catalogue at a cell, selects it and marks the panel dirty', () => {
    const s = run(start(), { type: 'add-tile', kind: 'reef-picker', id: 'reef', at: { x: 2, y: 1 } });
    expect(tile(s, 'reef')).toMatchObject({ kind: 'reef-picker', x: 2, y: 1, ...TILE_CATALOGUE['reef-picker'].defaultSize, channel: 'op/reef/branch' });
    expect(s.selection).toEqual(['reef']);
    expect(isDirty(s)).toBe(true);
  });

  it('places a tile without a drop cell at the first free spot', () => {
    const s = run(start(), { type: 'add-tile', kind: 'level-picker', id: 'a', at: { x: 0, y: 0 } }, { type: 'add-tile', kind: 'level-picker', id: 'b' });
    // The level picker is 2 cells wide by default, so the second one goes right of the first.
    expect([tile(s, 'b').x, tile(s, 'b').y]).toEqual([2, 0]);
  });

  it('undoes back to the saved document, which is not dirty', () => {
    let s = run(start(), { type: 'add-tile', kind: 'lamp', id: 'l', at: { x: 0, y: 0 } }, { type: 'move-selection', dx: 3, dy: 2 });
    expect([tile(s, 'l').x, tile(s, 'l').y]).toEqual([3, 2]);
    s = run(s, { type: 'undo' });
    expect([tile(s, 'l').x, tile(s, 'l').y]).toEqual([0, 0]);
    s = run(s, { type: 'undo' });
    expect(currentPage(s).tiles).toHaveLength(0);
    expect(s.selection).toEqual([]);
    expect(isDirty(s)).toBe(false);
    s = run(s, { type: 'redo' }, { type: 'redo' });
    expect([tile(s, 'l').x, tile(s, 'l').y]).toEqual([3, 2]);
  });

  it('duplicates the selection with the given ids and selects the copies', () => {
    const s = run(
      start(),
      { type: 'add-tile', kind: 'push-pad', id: 'p', at: { x: 0, y: 0 } },
      { type: 'duplicate', ids: ['p2'] },
    );
    expect(s.selection).toEqual(['p2']);
    expect([tile(s, 'p2').x, tile(s, 'p2').y]).toEqual([1, 1]);
  });

  it('aligns and deletes a multi-selection', () => {
    let s = run(
      start(),
      { type: 'add-tile', kind: 'lamp', id: 'a', at: { x: 1, y: 0 } },
      { type: 'add-tile', kind: 'lamp', id: 'b', at: { x: 6, y: 3 } },
      { type: 'select', ids: ['a'], mode: 'add' },
      { type: 'align', edge: 'top' },
    );
    expect(selectedTiles(s).map((t) => t.y)).toEqual([0, 0]);
    s = run(s, { type: 'delete-selection' });
    expect(currentPage(s).tiles).toEqual([]);
  });

  it('coalesces typing in one field into one undo step', () => {
    let s = run(start(), { type: 'add-tile', kind: 'caption', id: 'c', at: { x: 0, y: 0 } });
    for (const text of ['S', 'Sc', 'Sco', 'Scor', 'Score']) s = run(s, { type: 'update-tile', tileId: 'c', patch: { text }, coalesceKey: 'text' });
    s = run(s, { type: 'seal' }, { type: 'update-tile', tileId: 'c', patch: { label: 'Heading' }, coalesceKey: 'label' });
    s = run(s, { type: 'undo' });
    expect(tile(s, 'c')).toMatchObject({ text: 'Score', label: 'Caption' });
    s = run(s, { type: 'undo' });
    expect(tile(s, 'c')).toMatchObject({ text: 'Scoring' });
  });

  it('switches pages, clearing the selection, and falls back to the first page when the current one goes', () => {
    let s = run(start(), { type: 'add-tile', kind: 'lamp', id: 'a' }, { type: 'add-page', id: 'pit', name: 'Pit' });
    expect(s.pageId).toBe('pit');
    expect(s.selection).toEqual([]);
    s = run(s, { type: 'delete-page', pageId: 'pit' });
    expect(s.pageId).toBe('main');
    s = run(s, { type: 'undo' });
    expect(currentDocument(s).pages.map((p) => p.id)).toEqual(['main', 'pit']);
  });

  it('keeps the working copy through a conflict’s “keep mine” and bases the next save on their version', () => {
    const s = run(start(), { type: 'add-tile', kind: 'lamp', id: 'a' });
    const theirs = starterPanelDocument(presetDevice('tablet-1180x820'));
    const kept = run(s, { type: 'rebase', versionId: 'v2', document: theirs });
    expect(kept.baseVersionId).toBe('v2');
    expect(currentDocument(kept)).toBe(currentDocument(s));
    expect(isDirty(kept)).toBe(true);
  });

  it('takes a saved version as the new base with the history kept', () => {
    const s = run(start(), { type: 'add-tile', kind: 'lamp', id: 'a' });
    const saved = run(s, { type: 'saved', versionId: 'v2', document: currentDocument(s) });
    expect(isDirty(saved)).toBe(false);
    expect(saved.baseVersionId).toBe('v2');
    expect(run(saved, { type: 'undo' }).history.present.pages[0]!.tiles).toHaveLength(0);
  });

  it('ignores a selection of tiles that are not on the page', () => {
    const s = run(start(), { type: 'select', ids: ['ghost'], mode: 'replace' });
    expect(s.selection).toEqual([]);
  });
});
