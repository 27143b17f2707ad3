/** Undo and redo over whole editor states: `present` is the last committed one. */
export interface EditHistory<T> {
  past: T[];
  present: T;
  future: T[];
}

/** Steps kept for undo; older ones are dropped (a planner's session rarely needs more). */
export const HISTORY_LIMIT = 200;

export function createHistory<T>(present: T): EditHistory<T> {
  return { past: [], present, future: [] };
}

/** Records `next` as a new step; a new step clears the redo list. Committing the same state is a no-op. */
export function commitEdit<T>(h: EditHistory<T>, next: T, limit = HISTORY_LIMIT): EditHistory<T> {
  if (next === h.present) return h;
  const past = [...h.past, h.present];
  return { past: past.length > limit ? past.slice(past.length - limit) : past, present: next, future: [] };
}

export function undoEdit<T>(h: EditHistory<T>): EditHistory<T> {
  const previous = h.past[h.past.length - 1];
  if (previous === undefined) return h;
  return { past: h.past.slice(0, -1), present: previous, future: [h.present, ...h.future] };
}

export function redoEdit<T>(h: EditHistory<T>): EditHistory<T> {
  const next = h.future[0];
  if (next === undefined) return h;
  return { past: [...h.past, h.present], present: next, future: h.future.slice(1) };
}
