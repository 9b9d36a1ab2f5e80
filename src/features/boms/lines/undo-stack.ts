import { remapChange, type LineChange } from './line-changes';

/** One step back: the change that reverts a saved edit, and words for the Undo button's hint. */
export type UndoEntry = { label: string; change: LineChange };

export type UndoStack = readonly UndoEntry[];

/** Enough to walk back a session of edits; older steps fall off the bottom. */
export const UNDO_LIMIT = 100;

export function pushUndo(stack: UndoStack, entry: UndoEntry, limit = UNDO_LIMIT): UndoStack {
  const next = [...stack, entry];
  return next.length > limit ? next.slice(next.length - limit) : next;
}

/** The latest step and the stack without it; null on an empty stack. */
export function popUndo(stack: UndoStack): { entry: UndoEntry; rest: UndoStack } | null {
  if (stack.length === 0) return null;
  return { entry: stack[stack.length - 1], rest: stack.slice(0, -1) };
}

/**
 * After an undo re-created deleted lines under new ids, older steps that name the old
 * ids must name the new ones, or undoing further would patch lines that are gone.
 */
export function remapUndo(stack: UndoStack, ids: ReadonlyMap<string, string>): UndoStack {
  if (ids.size === 0) return stack;
  return stack.map((entry) => ({ ...entry, change: remapChange(entry.change, ids) }));
}

/** Drops steps that name a line no longer known (removed by someone else, or a reload). */
export function pruneUndo(stack: UndoStack, known: ReadonlySet<string>): UndoStack {
  return stack.filter(
    (entry) => entry.change.update.every((u) => known.has(u.id)) && entry.change.delete.every((id) => known.has(id)),
  );
}
