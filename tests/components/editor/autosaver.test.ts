import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { type Autosaver, createAutosaver } from '@/components/editor/autosaver';
import { readPendingCopy, readRecoveredCopies } from '@/components/editor/unsavedCopies';
import { type PlotStore, createPlotStore, updateShow } from '@/lib/plot';
import { demoDocument } from '../../lib/storage/support/documents';

const SHOW = 'sh-abcdefghijklmnop';

function memoryStorage() {
  const items = new Map<string, string>();
  return {
    items,
    getItem: (key: string) => items.get(key) ?? null,
    setItem: (key: string, value: string) => void items.set(key, value),
    removeItem: (key: string) => void items.delete(key),
  };
}

interface Sent {
  url: string;
  method: string;
  body: any;
}

/** A fake server: answers each request with `answer(sent)`; `null` means the network failed. */
function fakeFetch(answer: (sent: Sent) => { status: number; body: unknown } | null) {
  const sent: Sent[] = [];
  const fetch = vi.fn(async (url: RequestInfo | URL, init?: RequestInit) => {
    const request = {
      url: String(url),
      method: init?.method ?? 'GET',
      body: JSON.parse(String(init?.body ?? 'null')),
    };
    sent.push(request);
    const reply = answer(request);
    if (reply === null) throw new TypeError('Failed to fetch');
    return new Response(JSON.stringify(reply.body), { status: reply.status });
  });
  return { fetch: fetch as unknown as typeof globalThis.fetch, sent };
}

let store: PlotStore;
let autosaver: Autosaver | null = null;

beforeEach(() => {
  vi.useFakeTimers();
  store = createPlotStore(demoDocument());
});

afterEach(() => {
  autosaver?.stop();
  autosaver = null;
  vi.useRealTimers();
});

function start(options: { fetch: typeof globalThis.fetch; storage?: ReturnType<typeof memoryStorage> }) {
  const storage = options.storage ?? memoryStorage();
  autosaver = createAutosaver({
    showId: SHOW,
    revision: 4,
    store,
    storage,
    fetch: options.fetch,
    delayMs: 800,
    retryMs: 5000,
  });
  autosaver.start();
  return { autosaver, storage };
}

describe('autosave', () => {
  it('saves once, 800 ms after the last of several edits, on top of the revision it opened', async () => {
    let next = 5;
    const server = fakeFetch(() => ({ status: 200, body: { revision: next++ } }));
    const { autosaver, storage } = start({ fetch: server.fetch });
    store.dispatch(updateShow, { name: 'One' });
    await vi.advanceTimersByTimeAsync(500);
    store.dispatch(updateShow, { name: 'Two' });
    expect(autosaver.getSnapshot().status.kind).toBe('unsaved');
    await vi.advanceTimersByTimeAsync(799);
    expect(server.sent).toHaveLength(0);
    await vi.advanceTimersByTimeAsync(1);
    await vi.runAllTimersAsync();
    expect(server.sent).toHaveLength(1);
    expect(server.sent[0]).toMatchObject({
      url: `/api/shows/${SHOW}`,
      method: 'PUT',
      body: { baseRevision: 4 },
    });
    expect(server.sent[0].body.document.name).toBe('Two');
    expect(autosaver.getSnapshot()).toMatchObject({ status: { kind: 'saved' }, revision: 5 });
    expect(readPendingCopy(storage, SHOW)).toBeNull();

    store.dispatch(updateShow, { name: 'Three' });
    await vi.runAllTimersAsync();
    expect(server.sent[1].body.baseRevision).toBe(5);
    expect(autosaver.getSnapshot().revision).toBe(6);
  });

  it('offline: keeps the edits in the browser, says so, and retries until the server answers', async () => {
    let online = false;
    const server = fakeFetch(() => (online ? { status: 200, body: { revision: 5 } } : null));
    const { autosaver, storage } = start({ fetch: server.fetch });
    store.dispatch(updateShow, { name: 'Written offline' });
    await vi.advanceTimersByTimeAsync(800);
    expect(autosaver.getSnapshot().status.kind).toBe('offline');
    expect(readPendingCopy(storage, SHOW)).toMatchObject({
      baseRevision: 4,
      document: { name: 'Written offline' },
    });
    await vi.advanceTimersByTimeAsync(5000);
    expect(server.sent).toHaveLength(2);
    online = true;
    await vi.advanceTimersByTimeAsync(5000);
    expect(autosaver.getSnapshot()).toMatchObject({ status: { kind: 'saved' }, revision: 5 });
    expect(readPendingCopy(storage, SHOW)).toBeNull();
  });

  it('conflict: stops saving, keeps the edits, and saving on top uses the current revision', async () => {
    const server = fakeFetch((sent) =>
      sent.body.baseRevision === 4
        ? {
            status: 409,
            body: {
              error: 'Revision 5 was saved since revision 4',
              conflict: 'revision',
              currentRevision: 5,
            },
          }
        : { status: 200, body: { revision: 6 } },
    );
    const { autosaver, storage } = start({ fetch: server.fetch });
    store.dispatch(updateShow, { name: 'Mine' });
    await vi.runAllTimersAsync();
    expect(autosaver.getSnapshot().status).toMatchObject({
      kind: 'conflict',
      reason: 'revision',
      currentRevision: 5,
    });
    store.dispatch(updateShow, { name: 'Mine, edited further' });
    await vi.runAllTimersAsync();
    expect(server.sent).toHaveLength(1);
    expect(readPendingCopy(storage, SHOW)?.document.name).toBe('Mine, edited further');

    await autosaver.saveOnTop();
    expect(server.sent[1].body).toMatchObject({
      baseRevision: 5,
      document: { name: 'Mine, edited further' },
    });
    expect(autosaver.getSnapshot()).toMatchObject({ status: { kind: 'saved' }, revision: 6 });
  });

  it('conflict: saving as a new show posts a copy with its own name', async () => {
    const server = fakeFetch((sent) =>
      sent.method === 'POST'
        ? { status: 201, body: { show: { id: 'sh-newnewnewnewnewn' } } }
        : { status: 409, body: { error: 'in the bin', conflict: 'in-bin', currentRevision: 4 } },
    );
    const { autosaver } = start({ fetch: server.fetch });
    store.dispatch(updateShow, { name: 'Mine' });
    await vi.runAllTimersAsync();
    expect(autosaver.getSnapshot().status).toMatchObject({ kind: 'conflict', reason: 'in-bin' });
    expect(await autosaver.saveAsNewShow()).toBe('sh-newnewnewnewnewn');
    expect(server.sent[1]).toMatchObject({
      url: '/api/shows',
      body: { origin: 'copy', document: { name: 'Mine (my copy)' } },
    });
    expect(autosaver.hasUnsavedEdits()).toBe(false);
  });

  it('a refused save (e.g. too large) shows the server’s message and keeps the edits', async () => {
    const server = fakeFetch(() => ({
      status: 413,
      body: { error: 'The request is 12.0 MB; a show is limited to 10.0 MB.' },
    }));
    const { autosaver, storage } = start({ fetch: server.fetch });
    store.dispatch(updateShow, { name: 'Huge' });
    await vi.runAllTimersAsync();
    expect(autosaver.getSnapshot().status).toEqual({
      kind: 'error',
      message: 'The request is 12.0 MB; a show is limited to 10.0 MB.',
    });
    expect(readPendingCopy(storage, SHOW)?.document.name).toBe('Huge');
  });

  it('edits left unsaved are offered back on the next open, and restoring them saves them', async () => {
    const storage = memoryStorage();
    const offline = fakeFetch(() => null);
    const first = start({ fetch: offline.fetch, storage }).autosaver;
    store.dispatch(updateShow, { name: 'Never reached the server' });
    await vi.advanceTimersByTimeAsync(800);
    first.stop();
    autosaver = null;

    // Next visit: the server still has the original document at revision 4.
    store = createPlotStore(demoDocument());
    const server = fakeFetch(() => ({ status: 200, body: { revision: 5 } }));
    const second = start({ fetch: server.fetch, storage }).autosaver;
    expect(second.getSnapshot().recovered.map((copy) => copy.document.name)).toEqual([
      'Never reached the server',
    ]);
    expect(second.getInitialSnapshot().recovered).toEqual([]);
    // Still offered if the page is opened again before deciding.
    expect(readRecoveredCopies(storage, SHOW)).toHaveLength(1);

    second.restoreRecovered();
    expect(store.getDocument().name).toBe('Never reached the server');
    await vi.runAllTimersAsync();
    expect(server.sent[0].body).toMatchObject({
      baseRevision: 4,
      document: { name: 'Never reached the server' },
    });
    expect(second.getSnapshot()).toMatchObject({ status: { kind: 'saved' }, revision: 5, recovered: [] });
    expect(readRecoveredCopies(storage, SHOW)).toEqual([]);
  });

  it('a pending copy equal to what the server has is dropped without asking', () => {
    const storage = memoryStorage();
    storage.setItem(
      `throwline:unsaved:${SHOW}`,
      JSON.stringify({ baseRevision: 3, keptAt: '2026-01-01T00:00:00Z', document: demoDocument() }),
    );
    const { autosaver } = start({ fetch: fakeFetch(() => null).fetch, storage });
    expect(autosaver.getSnapshot().recovered).toEqual([]);
    expect(storage.items.size).toBe(0);
  });
});
