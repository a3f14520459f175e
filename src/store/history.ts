/**
 * Undo history of immutable documents: a pure data structure, so it is tested in Node and the store
 * only wraps it. Each entry is a whole document; unchanged blocks are shared between entries, so a step
 * costs about the size of what changed.
 */
export interface History<T> {
  readonly past: readonly T[];
  readonly present: T;
  readonly future: readonly T[];
}

/** Undo steps kept; older ones are dropped first. */
export const HISTORY_LIMIT = 500;

export function startHistory<T>(present: T): History<T> {
  return { past: [], present, future: [] };
}

/** Records a new present; the redo branch is discarded. A no-op change (same object) records nothing. */
export function pushHistory<T>(history: History<T>, next: T, limit = HISTORY_LIMIT): History<T> {
  if (next === history.present) return history;
  const past = [...history.past, history.present];
  return { past: past.length > limit ? past.slice(past.length - limit) : past, present: next, future: [] };
}

export function undoHistory<T>(history: History<T>): History<T> {
  const previous = history.past[history.past.length - 1];
  if (previous === undefined) return history;
  return { past: history.past.slice(0, -1), present: previous, future: [history.present, ...history.future] };
}

export function redoHistory<T>(history: History<T>): History<T> {
  const [next, ...rest] = history.future;
  if (next === undefined) return history;
  return { past: [...history.past, history.present], present: next, future: rest };
}
