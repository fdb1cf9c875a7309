import { describe, expect, it } from 'vitest';
import { canRedo, canUndo, createHistory, push, redo, resetHistory, seal, undo } from './history';

describe('push, undo and redo', () => {
  it('walks back and forth through the steps', () => {
    let h = createHistory('a');
    h = push(h, 'b');
    h = push(h, 'c');
    expect(canUndo(h)).toBe(true);
    expect(canRedo(h)).toBe(false);
    h = undo(h);
    expect(h.present).toBe('b');
    h = undo(h);
    expect(h.present).toBe('a');
    expect(canUndo(h)).toBe(false);
    expect(undo(h)).toBe(h);
    h = redo(h);
    h = redo(h);
    expect(h.present).toBe('c');
    expect(redo(h)).toBe(h);
  });

  it('clears redo when a new step is pushed after an undo', () => {
    let h = push(push(createHistory(1), 2), 3);
    h = push(undo(h), 4);
    expect(h.present).toBe(4);
    expect(canRedo(h)).toBe(false);
    expect(undo(h).present).toBe(2);
  });

  it('ignores a push of the present itself', () => {
    const state = { n: 1 };
    const h = createHistory(state);
    expect(push(h, state)).toBe(h);
  });
});

describe('coalescing', () => {
  it('folds every move of one drag into one undo step', () => {
    let h = createHistory({ x: 0 });
    for (let x = 1; x <= 30; x += 1) h = push(h, { x }, 'drag-1');
    h = seal(h);
    h = push(h, { x: 99 }, 'drag-2');
    expect(h.past).toHaveLength(2);
    h = undo(h);
    expect(h.present).toEqual({ x: 30 });
    h = undo(h);
    expect(h.present).toEqual({ x: 0 });
  });

  it('starts a new step after seal even with the same key', () => {
    let h = push(createHistory('a'), 'b', 'label');
    h = push(seal(h), 'c', 'label');
    expect(undo(h).present).toBe('b');
  });

  it('starts a new step after an undo even with the same key', () => {
    let h = push(createHistory('a'), 'b', 'k');
    h = push(push(undo(h), 'c', 'k'), 'd', 'k');
    expect(h.past).toEqual(['a']);
    expect(h.present).toBe('d');
  });
});

describe('bounded depth', () => {
  it('keeps at most `limit` undo steps, dropping the oldest', () => {
    let h = createHistory(0, 5);
    for (let i = 1; i <= 12; i += 1) h = push(h, i);
    expect(h.past).toEqual([7, 8, 9, 10, 11]);
    for (let i = 0; i < 10; i += 1) h = undo(h);
    expect(h.present).toBe(7);
  });
});

describe('resetHistory', () => {
  it('forgets undo and redo and keeps the limit', () => {
    const h = resetHistory(push(createHistory('a', 3), 'b'), 'loaded');
    expect(h).toEqual({ past: [], present: 'loaded', future: [], openKey: null, limit: 3 });
  });
});
