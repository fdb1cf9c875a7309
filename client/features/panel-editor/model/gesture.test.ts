import { describe, expect, it } from 'vitest';
import { findTile } from '../../../../shared/domain/panels/layout';
import { presetDevice, starterPanelDocument } from '../../../../shared/domain/panels/starter-panel';
import { cellSize } from '../../../../shared/domain/panels/grid';
import { editorReducer, initialEditorState, type EditorAction, type EditorState } from './editor-state';
import { canvasPointerDown, dragPreview, IDLE, marqueeRectPx, pointerCancel, pointerDown, pointerMove, pointerUp, type Gesture } from './gesture';

const doc = starterPanelDocument(presetDevice('tablet-1280x800'));
// 1280 × 800 over 16 × 10 cells: 80 px square cells.
const cell = cellSize(doc.device, doc.grid);

function setup(): EditorState {
  return [
    { type: 'add-tile', kind: 'lamp', id: 'a', at: { x: 0, y: 0 } },
    { type: 'add-tile', kind: 'lamp', id: 'b', at: { x: 4, y: 0 } },
    { type: 'clear-selection' },
  ].reduce((s, a) => editorReducer(s, a as EditorAction), initialEditorState(doc, 'v1'));
}

/** Plays pointer events into the machine and the reducer, as the canvas does. */
function play(s: EditorState, events: Array<['down', string, number, number, boolean?] | ['move', number, number] | ['up'] | ['cancel']>) {
  let g: Gesture = IDLE;
  const moves: Gesture[] = [];
  for (const e of events) {
    if (e[0] === 'down') {
      const step = pointerDown(g, { pointerId: 1, xPx: e[2], yPx: e[3], target: { kind: 'move', tileId: e[1] }, shiftKey: e[4] ?? false }, s.selection);
      g = step.gesture;
      s = step.actions.reduce(editorReducer, s);
    } else if (e[0] === 'move') {
      g = pointerMove(g, { pointerId: 1, xPx: e[1], yPx: e[2] }, s.selection);
      moves.push(g);
    } else if (e[0] === 'up') {
      const step = pointerUp(g, { pointerId: 1 }, cell, s.selection);
      g = step.gesture;
      s = step.actions.reduce(editorReducer, s);
    } else {
      g = pointerCancel();
    }
  }
  return { s, g, moves };
}

const at = (s: EditorState, id: string) => {
  const t = findTile(s.history.present, s.pageId, id)!;
  return [t.x, t.y];
};

describe('the canvas gesture', () => {
  it('selects on press and moves by whole cells on release, as one undo step', () => {
    const moves: Array<['move', number, number]> = Array.from({ length: 40 }, (_, i) => ['move', 10 + i * 4, 10 + i * 2]);
    const { s, g } = play(setup(), [['down', 'a', 10, 10], ...moves, ['up']]);
    // The last move is (166, 88): 156 px right and 78 px down from the press, ≈ 2 cells by 1 cell of 80 px.
    expect(at(s, 'a')).toEqual([2, 1]);
    expect(s.selection).toEqual(['a']);
    expect(g).toBe(IDLE);
    expect(editorReducer(s, { type: 'undo' }).history.present.pages[0]!.tiles.find((t) => t.id === 'a')).toMatchObject({ x: 0, y: 0 });
  });

  it('treats a press that moves less than the threshold as a click', () => {
    const { s, moves } = play(setup(), [['down', 'a', 10, 10], ['move', 12, 11], ['up']]);
    expect(moves[0]!.phase).toBe('pointing');
    expect(at(s, 'a')).toEqual([0, 0]);
  });

  it('shift-press toggles a tile into the selection, and a drag then moves both', () => {
    let { s } = play(setup(), [['down', 'a', 10, 10], ['up'], ['down', 'b', 330, 10, true], ['up']]);
    expect(s.selection).toEqual(['a', 'b']);
    ({ s } = play(s, [['down', 'b', 330, 10], ['move', 330, 60], ['move', 330, 170], ['up']]));
    expect(at(s, 'a')).toEqual([0, 2]);
    expect(at(s, 'b')).toEqual([4, 2]);
  });

  it('a click on one tile of a multi-selection picks just that tile', () => {
    const { s } = play(setup(), [['down', 'a', 10, 10], ['up'], ['down', 'b', 330, 10, true], ['up'], ['down', 'b', 330, 10], ['up']]);
    expect(s.selection).toEqual(['b']);
  });

  it('previews the drag in px and in snapped cells, and commits nothing when cancelled', () => {
    let g = pointerDown(IDLE, { pointerId: 7, xPx: 0, yPx: 0, target: { kind: 'move', tileId: 'a' }, shiftKey: false }, ['a']).gesture;
    g = pointerMove(g, { pointerId: 7, xPx: 130, yPx: -20 }, ['a']);
    expect(dragPreview(g, cell)).toEqual({ tileIds: ['a'], dxPx: 130, dyPx: -20, dx: 2, dy: 0 });
    const { s } = play(setup(), [['down', 'a', 0, 0], ['move', 200, 0], ['cancel'], ['up']]);
    expect(at(s, 'a')).toEqual([0, 0]);
  });

  it('ignores a second pointer while one is down', () => {
    const first = pointerDown(IDLE, { pointerId: 1, xPx: 0, yPx: 0, target: { kind: 'move', tileId: 'a' }, shiftKey: false }, []).gesture;
    const second = pointerDown(first, { pointerId: 2, xPx: 50, yPx: 50, target: { kind: 'move', tileId: 'b' }, shiftKey: false }, ['a']);
    expect(second.gesture).toBe(first);
    expect(pointerMove(first, { pointerId: 2, xPx: 300, yPx: 300 }, ['a'])).toBe(first);
  });

  it('resizes from a handle, clamped to the kind’s minimum size', () => {
    let s = setup();
    let g = pointerDown(IDLE, { pointerId: 1, xPx: 160, yPx: 80, target: { kind: 'resize', tileId: 'a', handle: 'se' }, shiftKey: false }, s.selection);
    s = g.actions.reduce(editorReducer, s);
    let gesture = pointerMove(g.gesture, { pointerId: 1, xPx: 330, yPx: 250 }, s.selection);
    expect(gesture.phase).toBe('resizing');
    g = pointerUp(gesture, { pointerId: 1 }, cell, s.selection);
    s = g.actions.reduce(editorReducer, s);
    const t = findTile(s.history.present, s.pageId, 'a')!;
    // 170 px right and 170 px down ≈ 2 cells each: the 2 × 1 lamp becomes 4 × 3.
    expect([t.w, t.h]).toEqual([4, 3]);
    gesture = pointerMove(pointerDown(IDLE, { pointerId: 1, xPx: 0, yPx: 0, target: { kind: 'resize', tileId: 'a', handle: 'se' }, shiftKey: false }, s.selection).gesture, { pointerId: 1, xPx: -900, yPx: -900 }, s.selection);
    s = pointerUp(gesture, { pointerId: 1 }, cell, s.selection).actions.reduce(editorReducer, s);
    const small = findTile(s.history.present, s.pageId, 'a')!;
    expect([small.w, small.h]).toEqual([1, 1]);
  });

  it('selects the tiles a rectangle drawn on the empty canvas touches, and adds to the selection with Shift', () => {
    let s = setup();
    // Lamps a (cells 0–1 × 0) and b (cells 4–5 × 0) on 80 px cells; a rectangle from (100, 90) up to (10, 10) touches only a.
    let step = canvasPointerDown(IDLE, { pointerId: 3, xPx: 100, yPx: 90, shiftKey: false });
    s = step.actions.reduce(editorReducer, s);
    let g = pointerMove(step.gesture, { pointerId: 3, xPx: 10, yPx: 10 }, s.selection);
    expect(marqueeRectPx(g)).toEqual({ xPx: 10, yPx: 10, widthPx: 90, heightPx: 80 });
    s = pointerUp(g, { pointerId: 3 }, cell, s.selection, s.history.present.pages[0]).actions.reduce(editorReducer, s);
    expect(s.selection).toEqual(['a']);
    step = canvasPointerDown(IDLE, { pointerId: 3, xPx: 330, yPx: 70, shiftKey: true });
    expect(step.actions).toEqual([]);
    g = pointerMove(step.gesture, { pointerId: 3, xPx: 400, yPx: 20 }, s.selection);
    s = pointerUp(g, { pointerId: 3 }, cell, s.selection, s.history.present.pages[0]).actions.reduce(editorReducer, s);
    expect(s.selection).toEqual(['a', 'b']);
  });

  it('clears the selection on a plain press on the empty canvas', () => {
    let s = play(setup(), [['down', 'a', 10, 10], ['up']]).s;
    const step = canvasPointerDown(IDLE, { pointerId: 1, xPx: 700, yPx: 500, shiftKey: false });
    s = step.actions.reduce(editorReducer, s);
    expect(s.selection).toEqual([]);
    expect(pointerUp(step.gesture, { pointerId: 1 }, cell, s.selection, s.history.present.pages[0]).actions).toEqual([]);
  });
});
