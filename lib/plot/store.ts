/**
 * The one store of a plot document. Every change goes through `dispatch(command, args)`, which runs
 * the command under immer's produceWithPatches and records the patches, so undo and redo are
 * unlimited. A drag is one undo step: `beginGesture()` on pointer-down, any number of dispatches,
 * then `endGesture()` on pointer-up squashes them into one entry, or `cancelGesture()` (Escape)
 * reverts to the state at pointer-down. A new change clears redo. Selection, zoom and hover are view
 * state and do not live here.
 */
import { tidyReferences } from './tidy';
import { type Patch, applyPatches, enablePatches, produceWithPatches } from 'immer';
import type { PlotDocument } from './schema/document';
import { type Command, CommandRefused } from './command';

enablePatches();

export interface HistoryEntry {
  readonly label: string;
  readonly patches: readonly Patch[];
  readonly inversePatches: readonly Patch[];
}

export type DispatchResult = { ok: true; changed: boolean } | { ok: false; message: string };

export interface PlotStore {
  getDocument(): PlotDocument;
  /** Listen for document changes; returns the unsubscribe function. */
  subscribe(listener: (document: PlotDocument) => void): () => void;
  dispatch<Args>(command: Command<Args>, args: Args): DispatchResult;
  undo(): boolean;
  redo(): boolean;
  canUndo(): boolean;
  canRedo(): boolean;
  /** Labels of the undo stack, oldest first. */
  undoLabels(): string[];
  redoLabels(): string[];
  beginGesture(label: string): void;
  endGesture(): void;
  cancelGesture(): void;
  /** Replace the whole document (open a file); clears history. */
  replaceDocument(document: PlotDocument): void;
}

interface Gesture {
  readonly label: string;
  readonly start: PlotDocument;
  patches: Patch[];
  inversePatches: Patch[];
}

export function createPlotStore(initial: PlotDocument): PlotStore {
  let document = initial;
  let undoStack: HistoryEntry[] = [];
  let redoStack: HistoryEntry[] = [];
  let gesture: Gesture | null = null;
  const listeners = new Set<(document: PlotDocument) => void>();

  const publish = () => {
    for (const listener of listeners) listener(document);
  };

  const record = (entry: HistoryEntry) => {
    undoStack = [...undoStack, entry];
    redoStack = [];
  };

  return {
    getDocument: () => document,
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    dispatch(command, args) {
      let next: PlotDocument;
      let patches: Patch[];
      let inversePatches: Patch[];
      try {
        [next, patches, inversePatches] = produceWithPatches(document, (draft) => {
          command.apply(draft, args);
          tidyReferences(draft);
        });
      } catch (error) {
        if (error instanceof CommandRefused) return { ok: false, message: error.message };
        if (error instanceof RangeError) return { ok: false, message: error.message };
        throw error;
      }
      if (patches.length === 0) return { ok: true, changed: false };
      document = next;
      if (gesture) {
        gesture.patches.push(...patches);
        gesture.inversePatches.unshift(...inversePatches);
      } else {
        record({ label: command.label(args), patches, inversePatches });
      }
      publish();
      return { ok: true, changed: true };
    },
    undo() {
      if (gesture) this.endGesture();
      const entry = undoStack.at(-1);
      if (!entry) return false;
      document = applyPatches(document, entry.inversePatches as Patch[]);
      undoStack = undoStack.slice(0, -1);
      redoStack = [...redoStack, entry];
      publish();
      return true;
    },
    redo() {
      const entry = redoStack.at(-1);
      if (!entry) return false;
      document = applyPatches(document, entry.patches as Patch[]);
      redoStack = redoStack.slice(0, -1);
      undoStack = [...undoStack, entry];
      publish();
      return true;
    },
    canUndo: () => undoStack.length > 0,
    canRedo: () => redoStack.length > 0,
    undoLabels: () => undoStack.map((entry) => entry.label),
    redoLabels: () => redoStack.map((entry) => entry.label),
    beginGesture(label) {
      if (gesture) this.endGesture();
      gesture = { label, start: document, patches: [], inversePatches: [] };
    },
    endGesture() {
      if (!gesture) return;
      const finished = gesture;
      gesture = null;
      if (finished.patches.length > 0) {
        record({ label: finished.label, patches: finished.patches, inversePatches: finished.inversePatches });
      }
    },
    cancelGesture() {
      if (!gesture) return;
      const changed = gesture.patches.length > 0;
      document = gesture.start;
      gesture = null;
      if (changed) publish();
    },
    replaceDocument(replacement) {
      gesture = null;
      document = replacement;
      undoStack = [];
      redoStack = [];
      publish();
    },
  };
}
