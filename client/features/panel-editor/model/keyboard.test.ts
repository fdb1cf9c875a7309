import { describe, expect, it } from 'vitest';
import { keyIntent } from './keyboard';

const key = (k: string, mods: Partial<{ shiftKey: boolean; ctrlKey: boolean; metaKey: boolean; altKey: boolean }> = {}) =>
  keyIntent({ key: k, shiftKey: false, ctrlKey: false, metaKey: false, altKey: false, ...mods });

describe('keyIntent', () => {
  it.each([
    ['ArrowLeft', {}, { type: 'nudge', dx: -1, dy: 0 }],
    ['ArrowDown', { shiftKey: true }, { type: 'nudge', dx: 0, dy: 4 }],
    ['Delete', {}, { type: 'delete' }],
    ['Backspace', {}, { type: 'delete' }],
    ['z', { ctrlKey: true }, { type: 'undo' }],
    ['z', { metaKey: true }, { type: 'undo' }],
    ['Z', { ctrlKey: true, shiftKey: true }, { type: 'redo' }],
    ['z', { metaKey: true, shiftKey: true }, { type: 'redo' }],
    ['y', { ctrlKey: true }, { type: 'redo' }],
    ['d', { ctrlKey: true }, { type: 'duplicate' }],
    ['d', { metaKey: true }, { type: 'duplicate' }],
    ['a', { ctrlKey: true }, { type: 'select-all' }],
    ['Escape', {}, { type: 'clear-selection' }],
  ])('%s with %o is %o', (k, mods, intent) => {
    expect(key(k, mods)).toEqual(intent);
  });

  it.each([
    ['d', {}],
    ['z', {}],
    ['ArrowLeft', { ctrlKey: true }],
    ['x', { ctrlKey: true }],
    ['z', { ctrlKey: true, altKey: true }],
  ])('%s with %o is not the designer’s', (k, mods) => {
    expect(key(k, mods)).toBeNull();
  });
});
