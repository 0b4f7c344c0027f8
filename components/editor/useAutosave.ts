'use client';

import { useEffect, useState, useSyncExternalStore } from 'react';
import type { PlotStore } from '@/lib/plot';
import { type Autosaver, type AutosaveSnapshot, createAutosaver } from './autosaver';
import type { CopyStorage } from './unsavedCopies';

/** localStorage, or (on the server, or when the browser disables it) a store that lasts this page. */
function browserStorage(): CopyStorage {
  try {
    if (typeof window !== 'undefined' && window.localStorage) return window.localStorage;
  } catch {
    // Storage disabled by the browser's settings: fall through.
  }
  const memory = new Map<string, string>();
  return {
    getItem: (key) => memory.get(key) ?? null,
    setItem: (key, value) => void memory.set(key, value),
    removeItem: (key) => void memory.delete(key),
  };
}

/**
 * Autosave the editor's store as show `showId` (see autosaver.ts): saves after edits, when the page
 * is hidden or left, and warns before leaving with edits the server does not have yet.
 */
export function useAutosave(
  store: PlotStore,
  showId: string,
  revision: number,
): [Autosaver, AutosaveSnapshot] {
  const [autosaver] = useState(() =>
    createAutosaver({
      showId,
      revision,
      store,
      storage: browserStorage(),
      fetch: (input, init) => globalThis.fetch(input, init),
    }),
  );
  useEffect(() => {
    autosaver.start();
    return () => autosaver.stop();
  }, [autosaver]);

  useEffect(() => {
    const onHide = () => {
      if (autosaver.hasUnsavedEdits()) void autosaver.flush({ keepalive: true });
    };
    const onVisibility = () => {
      if (document.visibilityState === 'hidden') onHide();
    };
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      if (!autosaver.hasUnsavedEdits()) return;
      void autosaver.flush({ keepalive: true });
      event.preventDefault();
    };
    const onOnline = () => void autosaver.flush();
    window.addEventListener('pagehide', onHide);
    window.addEventListener('beforeunload', onBeforeUnload);
    window.addEventListener('online', onOnline);
    document.addEventListener('visibilitychange', onVisibility);
    return () => {
      window.removeEventListener('pagehide', onHide);
      window.removeEventListener('beforeunload', onBeforeUnload);
      window.removeEventListener('online', onOnline);
      document.removeEventListener('visibilitychange', onVisibility);
    };
  }, [autosaver]);

  const snapshot = useSyncExternalStore(
    autosaver.subscribe,
    autosaver.getSnapshot,
    autosaver.getInitialSnapshot,
  );
  return [autosaver, snapshot];
}
