/**
 * The embedded store: one SQLite file through better-sqlite3, in WAL mode with full syncs, so a
 * save that has returned survives a crash of the server process. Each revision row holds the whole
 * document as JSON text (simple, and any revision opens without replaying patches; a demo-sized
 * plot is 10–25 kB, so thousands of autosaves stay within tens of MB).
 */
import { randomBytes } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { type PlotDocument, loadPlotText } from '@/lib/plot';
import { sameJson } from '@/lib/plot/sameJson';
import { summarizeChange } from './changeSummary';
import {
  type RevisionSummary,
  type SaveResult,
  type ShowOrigin,
  type ShowStore,
  type ShowSummary,
  type StoredRevision,
  type StoredShow,
} from './showStore';

/** Schema steps, applied in order; PRAGMA user_version records how many have run. */
const MIGRATIONS: readonly string[] = [
  `CREATE TABLE shows (
     id TEXT PRIMARY KEY,
     name TEXT NOT NULL,
     venue TEXT NOT NULL,
     head_revision INTEGER NOT NULL,
     created_at TEXT NOT NULL,
     updated_at TEXT NOT NULL,
     deleted_at TEXT
   );
   CREATE TABLE revisions (
     show_id TEXT NOT NULL REFERENCES shows(id),
     revision INTEGER NOT NULL,
     saved_at TEXT NOT NULL,
     name TEXT NOT NULL,
     summary TEXT NOT NULL,
     restored_from INTEGER,
     document TEXT NOT NULL,
     PRIMARY KEY (show_id, revision)
   );`,
];

const ORIGIN_SUMMARY: Record<ShowOrigin, string> = {
  created: 'created',
  imported: 'imported from a file',
  demo: 'created from a demo',
  copy: 'saved as a new show',
};

interface ShowRow {
  id: string;
  name: string;
  venue: string;
  head_revision: number;
  created_at: string;
  updated_at: string;
  deleted_at: string | null;
}

interface RevisionRow {
  show_id: string;
  revision: number;
  saved_at: string;
  name: string;
  summary: string;
  restored_from: number | null;
}

function newShowId(): string {
  const alphabet = 'abcdefghijklmnopqrstuvwxyz0123456789';
  const bytes = randomBytes(16);
  return `sh-${Array.from(bytes, (byte) => alphabet[byte % alphabet.length]).join('')}`;
}

function summaryOf(row: ShowRow): ShowSummary {
  return {
    id: row.id,
    name: row.name,
    venue: row.venue,
    revision: row.head_revision,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
    deletedAt: row.deleted_at,
  };
}

function revisionOf(row: RevisionRow): RevisionSummary {
  return {
    revision: row.revision,
    savedAt: row.saved_at,
    name: row.name,
    summary: row.summary,
    restoredFrom: row.restored_from,
  };
}

/** A stored document is re-validated when read: a damaged row is an error, never a half-document. */
function parseStored(text: string, where: string): PlotDocument {
  const loaded = loadPlotText(text);
  if (!loaded.ok) throw new Error(`stored ${where} is not a valid plot: ${loaded.errors[0]}`);
  return loaded.document;
}

export interface SqliteShowStoreOptions {
  /** Clock for timestamps (tests); defaults to now. */
  readonly now?: () => Date;
}

/** Open (creating and migrating as needed) the SQLite store at `file`. */
export function openSqliteShowStore(file: string, options: SqliteShowStoreOptions = {}): ShowStore {
  if (file !== ':memory:') mkdirSync(path.dirname(file), { recursive: true });
  const db = new Database(file);
  db.pragma('journal_mode = WAL');
  db.pragma('synchronous = FULL');
  db.pragma('foreign_keys = ON');
  db.pragma('busy_timeout = 5000');
  migrate(db);

  const now = () => (options.now ? options.now() : new Date()).toISOString();
  const statements = {
    showById: db.prepare<[string], ShowRow>('SELECT * FROM shows WHERE id = ?'),
    listLive: db.prepare<[], ShowRow>(
      'SELECT * FROM shows WHERE deleted_at IS NULL ORDER BY updated_at DESC, id',
    ),
    listBin: db.prepare<[], ShowRow>(
      'SELECT * FROM shows WHERE deleted_at IS NOT NULL ORDER BY deleted_at DESC, id',
    ),
    count: db.prepare<[], { count: number }>('SELECT COUNT(*) AS count FROM shows'),
    insertShow: db.prepare(
      `INSERT INTO shows (id, name, venue, head_revision, created_at, updated_at, deleted_at)
       VALUES (@id, @name, @venue, 1, @at, @at, NULL)`,
    ),
    updateHead: db.prepare(
      'UPDATE shows SET name = @name, venue = @venue, head_revision = @revision, updated_at = @at WHERE id = @id',
    ),
    insertRevision: db.prepare(
      `INSERT INTO revisions (show_id, revision, saved_at, name, summary, restored_from, document)
       VALUES (@showId, @revision, @at, @name, @summary, @restoredFrom, @document)`,
    ),
    revisionDocument: db.prepare<[string, number], { document: string }>(
      'SELECT document FROM revisions WHERE show_id = ? AND revision = ?',
    ),
    revisionRow: db.prepare<[string, number], RevisionRow & { document: string }>(
      'SELECT * FROM revisions WHERE show_id = ? AND revision = ?',
    ),
    revisionList: db.prepare<[string], RevisionRow>(
      `SELECT show_id, revision, saved_at, name, summary, restored_from FROM revisions
       WHERE show_id = ? ORDER BY revision DESC`,
    ),
    setDeleted: db.prepare<[string | null, string]>('UPDATE shows SET deleted_at = ? WHERE id = ?'),
  };

  const headDocument = (row: ShowRow): PlotDocument => {
    const stored = statements.revisionDocument.get(row.id, row.head_revision);
    if (!stored) throw new Error(`show ${row.id} has no revision ${row.head_revision}`);
    return parseStored(stored.document, `revision ${row.head_revision} of show ${row.id}`);
  };

  /** Append a revision on top of the head inside the caller's transaction. */
  const appendRevision = (
    row: ShowRow,
    document: PlotDocument,
    summary: string,
    restoredFrom: number | null,
  ) => {
    const revision = row.head_revision + 1;
    const at = now();
    statements.insertRevision.run({
      showId: row.id,
      revision,
      at,
      name: document.name,
      summary,
      restoredFrom,
      document: JSON.stringify(document),
    });
    statements.updateHead.run({ id: row.id, name: document.name, venue: document.venue, revision, at });
    return { revision, at };
  };

  const create = db.transaction((document: PlotDocument, origin: ShowOrigin): StoredShow => {
    const id = newShowId();
    const at = now();
    statements.insertShow.run({ id, name: document.name, venue: document.venue, at });
    statements.insertRevision.run({
      showId: id,
      revision: 1,
      at,
      name: document.name,
      summary: ORIGIN_SUMMARY[origin],
      restoredFrom: null,
      document: JSON.stringify(document),
    });
    const row = statements.showById.get(id) as ShowRow;
    return { ...summaryOf(row), document };
  });

  const save = db.transaction((id: string, baseRevision: number, document: PlotDocument): SaveResult => {
    const row = statements.showById.get(id);
    if (!row) return { ok: false, reason: 'not-found' };
    if (row.deleted_at !== null) return { ok: false, reason: 'in-bin', currentRevision: row.head_revision };
    if (row.head_revision !== baseRevision) {
      return { ok: false, reason: 'conflict', currentRevision: row.head_revision };
    }
    const head = headDocument(row);
    if (sameJson(head, document)) {
      return { ok: true, revision: row.head_revision, unchanged: true, savedAt: row.updated_at };
    }
    const written = appendRevision(row, document, summarizeChange(head, document), null);
    return { ok: true, revision: written.revision, unchanged: false, savedAt: written.at };
  });

  const restore = db.transaction((id: string, revision: number) => {
    const row = statements.showById.get(id);
    if (!row) return { ok: false as const, reason: 'not-found' as const };
    if (row.deleted_at !== null) return { ok: false as const, reason: 'in-bin' as const };
    const old = statements.revisionDocument.get(id, revision);
    if (!old) return { ok: false as const, reason: 'not-found' as const };
    const document = parseStored(old.document, `revision ${revision} of show ${id}`);
    const change = summarizeChange(headDocument(row), document);
    const summary = `restored revision ${revision}${change === 'no changes' ? '' : ` (${change})`}`;
    return { ok: true as const, revision: appendRevision(row, document, summary, revision).revision };
  });

  const setBin = (id: string, deletedAt: string | null, onlyIfBinned: boolean) => {
    const row = statements.showById.get(id);
    if (!row) return false;
    if (onlyIfBinned ? row.deleted_at === null : row.deleted_at !== null) return true;
    statements.setDeleted.run(deletedAt, id);
    return true;
  };

  return {
    async listShows(listOptions = {}) {
      return (listOptions.inBin ? statements.listBin : statements.listLive).all().map(summaryOf);
    },
    async createShow(document, origin = 'created') {
      return create.immediate(document, origin);
    },
    async getShow(id) {
      const row = statements.showById.get(id);
      return row ? { ...summaryOf(row), document: headDocument(row) } : null;
    },
    async saveShow(id, baseRevision, document) {
      return save.immediate(id, baseRevision, document);
    },
    async listRevisions(id) {
      if (!statements.showById.get(id)) return null;
      return statements.revisionList.all(id).map(revisionOf);
    },
    async getRevision(id, revision): Promise<StoredRevision | null> {
      const row = statements.revisionRow.get(id, revision);
      if (!row) return null;
      return {
        ...revisionOf(row),
        showId: id,
        document: parseStored(row.document, `revision ${revision} of show ${id}`),
      };
    },
    async restoreRevision(id, revision) {
      return restore.immediate(id, revision);
    },
    async moveToBin(id) {
      return setBin(id, now(), false);
    },
    async restoreFromBin(id) {
      return setBin(id, null, true);
    },
    async countShows() {
      return (statements.count.get() as { count: number }).count;
    },
    async close() {
      if (db.open) db.close();
    },
  };
}

function migrate(db: Database.Database): void {
  const apply = db.transaction(() => {
    const version = db.pragma('user_version', { simple: true }) as number;
    if (version > MIGRATIONS.length) {
      throw new Error(
        `the database is at schema version ${version}, made by a newer Throwline; this one knows up to ${MIGRATIONS.length}`,
      );
    }
    for (let step = version; step < MIGRATIONS.length; step += 1) db.exec(MIGRATIONS[step]);
    db.pragma(`user_version = ${MIGRATIONS.length}`);
  });
  apply.immediate();
}
