import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { seedDemos } from '@/lib/storage/seedDemos';
import { SHOW_ID_PATTERN, type ShowStore } from '@/lib/storage/showStore';
import { openSqliteShowStore } from '@/lib/storage/sqliteShowStore';
import { demoDocument, withFixtureMoved } from './support/documents';

let dir: string;
let file: string;
let store: ShowStore;
let clock: number;

beforeEach(() => {
  dir = mkdtempSync(path.join(tmpdir(), 'throwline-store-'));
  file = path.join(dir, 'nested', 'shows.db');
  clock = Date.UTC(2026, 0, 1);
  store = openSqliteShowStore(file, { now: () => new Date((clock += 1000)) });
});

afterEach(async () => {
  await store.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('the SQLite show store', () => {
  it('creates the file (and its folder) in WAL mode with the schema version recorded', () => {
    const db = new Database(file, { readonly: true });
    expect(db.pragma('journal_mode', { simple: true })).toBe('wal');
    expect(db.pragma('user_version', { simple: true })).toBe(1);
    db.close();
  });

  it('every save is a new revision; old revisions keep their documents', async () => {
    const original = demoDocument();
    const show = await store.createShow(original);
    expect(show.id).toMatch(SHOW_ID_PATTERN);
    expect(show.revision).toBe(1);
    const moved = withFixtureMoved(original, 0, 1);
    const saved = await store.saveShow(show.id, 1, moved);
    expect(saved).toMatchObject({ ok: true, revision: 2, unchanged: false });
    expect((await store.getShow(show.id))?.document).toEqual(moved);
    expect((await store.getRevision(show.id, 1))?.document).toEqual(original);
    const revisions = await store.listRevisions(show.id);
    expect(revisions?.map((entry) => [entry.revision, entry.summary])).toEqual([
      [2, '1 fixture moved'],
      [1, 'created'],
    ]);
  });

  it('a save based on an old revision is refused and writes nothing', async () => {
    const original = demoDocument();
    const show = await store.createShow(original);
    await store.saveShow(show.id, 1, withFixtureMoved(original, 0, 1));
    const late = await store.saveShow(show.id, 1, withFixtureMoved(original, 1, 2));
    expect(late).toEqual({ ok: false, reason: 'conflict', currentRevision: 2 });
    expect((await store.listRevisions(show.id))?.length).toBe(2);
  });

  it('saving the same document again stores nothing new', async () => {
    const show = await store.createShow(demoDocument());
    expect(await store.saveShow(show.id, 1, structuredClone(show.document))).toMatchObject({
      ok: true,
      revision: 1,
      unchanged: true,
    });
    expect((await store.listRevisions(show.id))?.length).toBe(1);
  });

  it('restoring a revision adds a new one with its document and says where it came from', async () => {
    const original = demoDocument();
    const show = await store.createShow(original);
    await store.saveShow(show.id, 1, withFixtureMoved(original, 0, 1));
    expect(await store.restoreRevision(show.id, 1)).toEqual({ ok: true, revision: 3 });
    expect((await store.getShow(show.id))?.document).toEqual(original);
    const [newest] = (await store.listRevisions(show.id)) ?? [];
    expect(newest).toMatchObject({
      revision: 3,
      restoredFrom: 1,
      summary: 'restored revision 1 (1 fixture moved)',
    });
    expect(await store.restoreRevision(show.id, 9)).toEqual({ ok: false, reason: 'not-found' });
  });

  it('the bin: a binned show leaves the list, refuses saves, and comes back intact', async () => {
    const show = await store.createShow(demoDocument());
    expect(await store.moveToBin(show.id)).toBe(true);
    expect(await store.listShows()).toEqual([]);
    expect((await store.listShows({ inBin: true })).map((entry) => entry.id)).toEqual([show.id]);
    expect(await store.saveShow(show.id, 1, withFixtureMoved(show.document, 0, 1))).toEqual({
      ok: false,
      reason: 'in-bin',
      currentRevision: 1,
    });
    expect(await store.restoreFromBin(show.id)).toBe(true);
    expect((await store.listShows()).map((entry) => entry.id)).toEqual([show.id]);
    expect((await store.getShow(show.id))?.document).toEqual(show.document);
    expect(await store.moveToBin('sh-nosuchshow00000')).toBe(false);
  });

  it('lists the most recently saved show first and survives closing and reopening', async () => {
    const first = await store.createShow(demoDocument('interview.json'));
    const second = await store.createShow(demoDocument('conference.json'));
    await store.saveShow(first.id, 1, withFixtureMoved(first.document, 0, 0.5));
    expect((await store.listShows()).map((entry) => entry.id)).toEqual([first.id, second.id]);
    await store.close();
    store = openSqliteShowStore(file);
    expect((await store.listShows()).map((entry) => [entry.id, entry.revision])).toEqual([
      [first.id, 2],
      [second.id, 1],
    ]);
  });

  it('seeds the three demos into an empty store only', async () => {
    const demos = path.resolve(import.meta.dirname, '..', '..', '..', 'public', 'demo');
    expect(await seedDemos(store, demos)).toBe(3);
    expect(await seedDemos(store, demos)).toBe(0);
    const names = (await store.listShows()).map((entry) => entry.name);
    expect(names[0]).toBe('The Salt Ledger — studio plot');
    expect(names).toHaveLength(3);
  });

  it('refuses a database made by a newer schema instead of guessing', async () => {
    await store.close();
    const db = new Database(file);
    db.pragma('user_version = 99');
    db.close();
    expect(() => openSqliteShowStore(file)).toThrow(/schema version 99/);
    store = openSqliteShowStore(path.join(dir, 'other.db'));
  });

  it('a damaged stored document is an error, never a half-document', async () => {
    const show = await store.createShow(demoDocument());
    const db = new Database(file);
    db.prepare('UPDATE revisions SET document = ? WHERE show_id = ?').run(
      '{"format":"throwline-plot"',
      show.id,
    );
    db.close();
    await expect(store.getShow(show.id)).rejects.toThrow(/not a valid plot/);
  });
});
