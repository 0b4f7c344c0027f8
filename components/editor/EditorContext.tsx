'use client';

import {
  type ReactNode,
  createContext,
  useCallback,
  useContext,
  useMemo,
  useState,
  useSyncExternalStore,
} from 'react';
import {
  type Command,
  type DerivedPlot,
  type DispatchResult,
  type PlotDocument,
  type PlotStore,
  createPlotDeriver,
  createPlotStore,
} from '@/lib/plot';

/** What kind of item an id in the plot names. */
export type ItemKind = 'fixture' | 'position' | 'subject' | 'viewpoint' | 'area';

export interface EditorApi {
  readonly document: PlotDocument;
  readonly derived: DerivedPlot;
  readonly store: PlotStore;
  /** Run a command; a refusal is shown in the status line and returned. */
  run<Args>(command: Command<Args>, args: Args): DispatchResult;
  /** Selected item ids (ids are unique across the whole plot). */
  readonly selection: readonly string[];
  select(ids: readonly string[]): void;
  kindOf(id: string): ItemKind | null;
  /** The last message for the user (a refusal or a notice), or null. */
  readonly message: string | null;
  setMessage(message: string | null): void;
  readonly units: 'metric' | 'imperial';
}

const EditorContext = createContext<EditorApi | null>(null);

export function useEditor(): EditorApi {
  const api = useContext(EditorContext);
  if (!api) throw new Error('useEditor must be used inside <EditorProvider>');
  return api;
}

/** Holds one open plot: its store (document + history), derived figures, selection and messages. */
export function EditorProvider({
  initialDocument,
  children,
}: {
  initialDocument: PlotDocument;
  children: ReactNode;
}) {
  const [store] = useState(() => createPlotStore(initialDocument));
  const document = useSyncExternalStore(store.subscribe, store.getDocument, store.getDocument);
  const [derive] = useState(() => createPlotDeriver());
  const derived = useMemo(() => derive(document), [derive, document]);
  const [selection, setSelection] = useState<readonly string[]>([]);
  const [message, setMessage] = useState<string | null>(null);

  const run = useCallback(
    <Args,>(command: Command<Args>, args: Args): DispatchResult => {
      const result = store.dispatch(command, args);
      setMessage(result.ok ? null : result.message);
      return result;
    },
    [store],
  );

  const kindOf = useCallback(
    (id: string): ItemKind | null => {
      if (document.fixtures.some((item) => item.id === id)) return 'fixture';
      if (document.positions.some((item) => item.id === id)) return 'position';
      if (document.subjects.some((item) => item.id === id)) return 'subject';
      if (document.viewpoints.some((item) => item.id === id)) return 'viewpoint';
      if (document.stage.acting.some((item) => item.id === id)) return 'area';
      return null;
    },
    [document],
  );

  // Drop ids that no longer exist (after delete or undo) so panels never show a ghost.
  const liveSelection = useMemo(() => selection.filter((id) => kindOf(id) !== null), [selection, kindOf]);

  const api = useMemo<EditorApi>(
    () => ({
      document,
      derived,
      store,
      run,
      selection: liveSelection,
      select: setSelection,
      kindOf,
      message,
      setMessage,
      units: document.displayUnits,
    }),
    [document, derived, store, run, liveSelection, kindOf, message],
  );
  return <EditorContext.Provider value={api}>{children}</EditorContext.Provider>;
}
