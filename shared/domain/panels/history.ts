// Pure: imports nothing. Undo and redo as a bounded stack of whole states (panel documents are immutable and
// share unchanged pages and tiles, so a step costs little more than what changed).

export type History<T> = {
  /** Oldest first; the newest is what undo returns to. */
  readonly past: readonly T[];
  readonly present: T;
  /** Nearest first: what redo goes to. */
  readonly future: readonly T[];
  /** The key of the step being coalesced (a drag, a typed word), or null when the next push starts a new step. */
  readonly openKey: string | null;
  /** At most this many undo steps are kept. */
  readonly limit: number;
};

export const DEFAULT_HISTORY_LIMIT = 100;

/** A history holding `present` with nothing to undo or redo. */
export function createHistory<T>(present: T, limit = DEFAULT_HISTORY_LIMIT): History<T> {
  return { past: [], present, future: [], openKey: null, limit: Math.max(1, Math.floor(limit)) };
}

/**
 * Records `next` as the new present. The same value (by identity) changes nothing. With a `coalesceKey`
 * equal to the open step's key, `next` replaces the present instead of adding a step, so the many moves of
 * one drag, or the keystrokes of one field, undo together; `seal` closes the step. Redo is cleared.
 */
export function push<T>(h: History<T>, next: T, coalesceKey: string | null = null): History<T> {
  if (Object.is(next, h.present)) return h;
  if (coalesceKey !== null && coalesceKey === h.openKey) {
    return { ...h, present: next, future: [] };
  }
  const past = [...h.past, h.present];
  return { ...h, past: past.length > h.limit ? past.slice(past.length - h.limit) : past, present: next, future: [], openKey: coalesceKey };
}

/** Ends the open coalesced step, so the next push is a step of its own. */
export function seal<T>(h: History<T>): History<T> {
  return h.openKey === null ? h : { ...h, openKey: null };
}

export const canUndo = (h: History<unknown>): boolean => h.past.length > 0;
export const canRedo = (h: History<unknown>): boolean => h.future.length > 0;

/** Goes back one step; nothing to undo returns `h` itself. */
export function undo<T>(h: History<T>): History<T> {
  if (h.past.length === 0) return h;
  return { ...h, past: h.past.slice(0, -1), present: h.past[h.past.length - 1]!, future: [h.present, ...h.future], openKey: null };
}

/** Goes forward one step; nothing to redo returns `h` itself. */
export function redo<T>(h: History<T>): History<T> {
  if (h.future.length === 0) return h;
  return { ...h, past: [...h.past, h.present], present: h.future[0]!, future: h.future.slice(1), openKey: null };
}

/** Starts over from `present` (a loaded version), forgetting undo and redo. */
export function resetHistory<T>(h: History<T>, present: T): History<T> {
  return createHistory(present, h.limit);
}
