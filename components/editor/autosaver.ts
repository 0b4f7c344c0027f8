/**
 * Autosave for one open show, without React: watches the plot store, saves shortly after edits
 * (debounced) with the revision the edits are based on, and reports a save state. A save the server
 * refuses as a conflict stops autosave until the user chooses how to keep both versions; a save that
 * cannot reach the server keeps the edits in the browser and retries. Nothing is thrown away
 * without the user saying so.
 */
import type { PlotDocument, PlotStore } from '@/lib/plot';
import { sameJson } from '@/lib/plot/sameJson';
import {
  type CopyStorage,
  type UnsavedCopy,
  dropPendingCopy,
  keepPendingCopy,
  readPendingCopy,
  readRecoveredCopies,
  writeRecoveredCopies,
} from './unsavedCopies';

export type SaveStatus =
  | { readonly kind: 'saved' }
  | { readonly kind: 'unsaved' }
  | { readonly kind: 'saving' }
  | { readonly kind: 'offline' }
  | { readonly kind: 'error'; readonly message: string }
  | {
      readonly kind: 'conflict';
      readonly reason: 'revision' | 'in-bin';
      readonly currentRevision: number;
      readonly message: string;
    };

export interface AutosaveSnapshot {
  readonly status: SaveStatus;
  /** The server revision the editor's document is based on. */
  readonly revision: number;
  /** Copies of earlier unsaved edits found in this browser, newest first, waiting for a decision. */
  readonly recovered: readonly UnsavedCopy[];
  /** False when the browser refused to keep a copy (storage full or disabled). */
  readonly keptLocally: boolean;
}

export interface AutosaverOptions {
  readonly showId: string;
  readonly revision: number;
  readonly store: PlotStore;
  readonly storage: CopyStorage;
  readonly fetch: typeof fetch;
  /** Wait after the last edit before saving, ms. */
  readonly delayMs?: number;
  /** Wait before trying again after the server could not be reached, ms. */
  readonly retryMs?: number;
  readonly now?: () => Date;
}

export interface Autosaver {
  getSnapshot(): AutosaveSnapshot;
  /** The state before anything was read from the browser (server rendering and hydration). */
  getInitialSnapshot(): AutosaveSnapshot;
  subscribe(listener: () => void): () => void;
  /** Save now (leaving the page uses `keepalive` so the request outlives it). */
  flush(options?: { keepalive?: boolean }): Promise<void>;
  /** True while the editor holds edits the server has not acknowledged. */
  hasUnsavedEdits(): boolean;
  /** Conflict: save the editor's document as a new revision on top of the current one. */
  saveOnTop(): Promise<void>;
  /** Conflict (or any time): save the editor's document as a new show; resolves to its id. */
  saveAsNewShow(): Promise<string | null>;
  /** Put the newest recovered copy into the editor (then it is saved like any edit). */
  restoreRecovered(): void;
  /** Throw away the newest recovered copy (the user chose to). */
  discardRecovered(): void;
  /** Start watching the store (idempotent). */
  start(): void;
  /** Stop watching; edits not yet saved are kept in the browser and sent at once. */
  stop(): void;
}

interface SaveResponse {
  readonly status: number;
  readonly body: Record<string, unknown>;
}

const COPY_SUFFIX = ' (my copy)';

/** Start autosaving `store` as revision `revision` of show `showId`. */
export function createAutosaver(options: AutosaverOptions): Autosaver {
  const { showId, store, storage } = options;
  const delayMs = options.delayMs ?? 800;
  const retryMs = options.retryMs ?? 5000;
  const now = options.now ?? (() => new Date());

  let revision = options.revision;
  /** The document the server holds at `revision` (as far as this editor knows). */
  let savedDocument: PlotDocument = store.getDocument();
  let status: SaveStatus = { kind: 'saved' };
  let keptLocally = true;
  let recovered = readRecoveredCopies(storage, showId);
  let timer: ReturnType<typeof setTimeout> | null = null;
  let inFlight: Promise<void> | null = null;
  let again = false;
  let running = false;
  let unsubscribe: (() => void) | null = null;
  const listeners = new Set<() => void>();

  const publish = () => {
    snapshot = { status, revision, recovered, keptLocally };
    for (const listener of listeners) listener();
  };
  const setStatus = (next: SaveStatus) => {
    status = next;
    publish();
  };
  const halted = () => status.kind === 'conflict';
  const dirty = () => store.getDocument() !== savedDocument;

  const keepCopy = (document: PlotDocument) => {
    keptLocally = keepPendingCopy(storage, showId, {
      baseRevision: revision,
      keptAt: now().toISOString(),
      document,
    });
  };

  // A pending copy from an earlier visit that the server does not have is offered back.
  const pending = readPendingCopy(storage, showId);
  if (pending !== null) {
    if (!sameJson(pending.document, savedDocument)) {
      recovered = [pending, ...recovered];
      writeRecoveredCopies(storage, showId, recovered);
    }
    dropPendingCopy(storage, showId);
  }
  let snapshot: AutosaveSnapshot = { status, revision, recovered, keptLocally };
  /** What the server renders (it cannot see the browser's copies), also used while hydrating. */
  const initialSnapshot: AutosaveSnapshot = { status, revision, recovered: [], keptLocally: true };

  const schedule = (wait: number) => {
    if (timer !== null) clearTimeout(timer);
    timer = null;
    if (!running) return;
    timer = setTimeout(() => {
      timer = null;
      void flush();
    }, wait);
  };

  const put = async (
    document: PlotDocument,
    baseRevision: number,
    keepalive = false,
  ): Promise<SaveResponse | null> => {
    try {
      const response = await options.fetch(`/api/shows/${showId}`, {
        method: 'PUT',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ baseRevision, document }),
        keepalive,
      });
      const body = (await response.json().catch(() => ({}))) as Record<string, unknown>;
      return { status: response.status, body };
    } catch {
      return null;
    }
  };

  /** Act on the server's answer to saving `document`. */
  const settle = (document: PlotDocument, answer: SaveResponse | null) => {
    if (answer === null) {
      setStatus({ kind: 'offline' });
      schedule(retryMs);
      return;
    }
    const message = typeof answer.body.error === 'string' ? answer.body.error : `HTTP ${answer.status}`;
    if (answer.status === 200 && typeof answer.body.revision === 'number') {
      revision = answer.body.revision;
      savedDocument = document;
      if (dirty()) {
        keepCopy(store.getDocument());
        setStatus({ kind: 'unsaved' });
        schedule(delayMs);
      } else {
        dropPendingCopy(storage, showId);
        setStatus({ kind: 'saved' });
      }
      return;
    }
    if (answer.status === 409) {
      const current = answer.body.currentRevision;
      setStatus({
        kind: 'conflict',
        reason: answer.body.conflict === 'in-bin' ? 'in-bin' : 'revision',
        currentRevision: typeof current === 'number' ? current : revision,
        message,
      });
      return;
    }
    setStatus({ kind: 'error', message });
    if (answer.status >= 500) schedule(retryMs);
  };

  async function flush(flushOptions: { keepalive?: boolean } = {}): Promise<void> {
    if (halted()) return;
    if (timer !== null) {
      clearTimeout(timer);
      timer = null;
    }
    if (inFlight) {
      again = true;
      return inFlight;
    }
    const document = store.getDocument();
    if (document === savedDocument) {
      if (status.kind !== 'saved') setStatus({ kind: 'saved' });
      return;
    }
    keepCopy(document);
    setStatus({ kind: 'saving' });
    inFlight = (async () => {
      settle(document, await put(document, revision, flushOptions.keepalive));
    })();
    try {
      await inFlight;
    } finally {
      inFlight = null;
    }
    if (again) {
      again = false;
      if (status.kind === 'unsaved' || status.kind === 'saving') await flush();
    }
  }

  const onStoreChange = () => {
    if (!running) return;
    if (!dirty()) {
      if (status.kind === 'unsaved') setStatus({ kind: 'saved' });
      return;
    }
    if (halted()) {
      keepCopy(store.getDocument());
      return;
    }
    if (status.kind === 'saved' || status.kind === 'error') setStatus({ kind: 'unsaved' });
    schedule(delayMs);
  };

  return {
    getSnapshot: () => snapshot,
    getInitialSnapshot: () => initialSnapshot,
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    flush,
    hasUnsavedEdits: () => dirty() || inFlight !== null,
    async saveOnTop() {
      if (status.kind !== 'conflict' || status.reason !== 'revision') return;
      const document = store.getDocument();
      const base = status.currentRevision;
      keepCopy(document);
      setStatus({ kind: 'saving' });
      settle(document, await put(document, base));
    },
    async saveAsNewShow() {
      const current = store.getDocument();
      const name =
        current.name.length + COPY_SUFFIX.length <= 120 ? `${current.name}${COPY_SUFFIX}` : current.name;
      const document = { ...current, name };
      keepCopy(current);
      try {
        const response = await options.fetch('/api/shows', {
          method: 'POST',
          headers: { 'Content-Type': 'application/json' },
          body: JSON.stringify({ document, origin: 'copy' }),
        });
        const body = (await response.json().catch(() => ({}))) as {
          show?: { id?: string };
          error?: string;
        };
        if (response.status !== 201 || typeof body.show?.id !== 'string') {
          setStatus({ kind: 'error', message: body.error ?? `HTTP ${response.status}` });
          return null;
        }
        // This editor's edits now live in the new show: nothing here is left unsaved.
        savedDocument = current;
        dropPendingCopy(storage, showId);
        return body.show.id;
      } catch {
        setStatus({ kind: 'offline' });
        return null;
      }
    },
    restoreRecovered() {
      const [copy, ...rest] = recovered;
      if (!copy) return;
      recovered = rest;
      writeRecoveredCopies(storage, showId, recovered);
      store.replaceDocument(copy.document);
      if (copy.baseRevision !== revision) {
        keepCopy(copy.document);
        setStatus({
          kind: 'conflict',
          reason: 'revision',
          currentRevision: revision,
          message: `These edits were made on revision ${copy.baseRevision}; the show has been saved since (revision ${revision}).`,
        });
      } else {
        publish();
      }
    },
    discardRecovered() {
      recovered = recovered.slice(1);
      writeRecoveredCopies(storage, showId, recovered);
      publish();
    },
    start() {
      if (running) return;
      running = true;
      unsubscribe = store.subscribe(onStoreChange);
      if (dirty() && !halted()) schedule(delayMs);
    },
    stop() {
      if (!running) return;
      running = false;
      unsubscribe?.();
      unsubscribe = null;
      if (timer !== null) clearTimeout(timer);
      timer = null;
      if (dirty()) {
        keepCopy(store.getDocument());
        if (!halted()) void flush({ keepalive: true });
      }
    },
  };
}
