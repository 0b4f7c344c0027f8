/** One generic check for every command: apply → undo → redo, with the document valid after each. */
import { expect } from 'vitest';
import { type Command, type PlotDocument, createPlotStore, plotDocument } from '@/lib/plot';

/**
 * Applies `command` to `document` through a store and checks: it changes the document, the result
 * is a valid document, undo restores the original exactly, redo restores the changed one exactly.
 * Returns the changed document for command-specific assertions.
 */
export function expectUndoableChange<Args>(
  document: PlotDocument,
  command: Command<Args>,
  args: Args,
): PlotDocument {
  const store = createPlotStore(document);
  const result = store.dispatch(command, args);
  expect(result).toEqual({ ok: true, changed: true });
  const changed = store.getDocument();
  expect(changed).not.toEqual(document);
  expect(plotDocument.safeParse(changed).success).toBe(true);
  expect(store.undo()).toBe(true);
  expect(store.getDocument()).toEqual(document);
  expect(store.redo()).toBe(true);
  expect(store.getDocument()).toEqual(changed);
  return changed;
}

/** Applies `command` and checks it is refused with a message matching `message`, leaving the document as it was. */
export function expectRefused<Args>(
  document: PlotDocument,
  command: Command<Args>,
  args: Args,
  message: RegExp,
): void {
  const store = createPlotStore(document);
  const result = store.dispatch(command, args);
  expect(result.ok).toBe(false);
  if (!result.ok) expect(result.message).toMatch(message);
  expect(store.getDocument()).toBe(document);
  expect(store.canUndo()).toBe(false);
}
