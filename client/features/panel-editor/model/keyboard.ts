// Pure: the designer's keyboard shortcuts as editor intents.
export type KeyInput = { key: string; shiftKey: boolean; ctrlKey: boolean; metaKey: boolean; altKey: boolean };

export type KeyIntent =
  | { type: 'nudge'; dx: number; dy: number }
  | { type: 'delete' }
  | { type: 'undo' }
  | { type: 'redo' }
  | { type: 'duplicate' }
  | { type: 'select-all' }
  | { type: 'clear-selection' };

/** Cells an arrow key moves the selection by, and with Shift. */
export const NUDGE_CELLS = 1;
export const NUDGE_FAR_CELLS = 4;

const ARROWS: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, -1], ArrowDown: [0, 1] };

/**
 * The intent of a key press on the canvas: arrows nudge one cell (Shift: four), Delete or Backspace deletes,
 * Ctrl/Cmd+Z undoes, Shift+Ctrl/Cmd+Z or Ctrl+Y redoes, Ctrl/Cmd+D duplicates, Ctrl/Cmd+A selects all,
 * Escape clears the selection. Anything else is not the designer's.
 */
export function keyIntent(e: KeyInput): KeyIntent | null {
  const mod = e.ctrlKey || e.metaKey;
  if (e.altKey) return null;
  const arrow = ARROWS[e.key];
  if (arrow && !mod) {
    const step = e.shiftKey ? NUDGE_FAR_CELLS : NUDGE_CELLS;
    return { type: 'nudge', dx: arrow[0] * step, dy: arrow[1] * step };
  }
  if ((e.key === 'Delete' || e.key === 'Backspace') && !mod) return { type: 'delete' };
  if (e.key === 'Escape' && !mod) return { type: 'clear-selection' };
  if (!mod) return null;
  const key = e.key.toLowerCase();
  if (key === 'z') return e.shiftKey ? { type: 'redo' } : { type: 'undo' };
  if (key === 'y' && e.ctrlKey) return { type: 'redo' };
  if (key === 'd' && !e.shiftKey) return { type: 'duplicate' };
  if (key === 'a' && !e.shiftKey) return { type: 'select-all' };
  return null;
}
