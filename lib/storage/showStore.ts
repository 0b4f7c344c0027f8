/**
 * The server's store of shows, behind one interface so the embedded SQLite store can be replaced by
 * a server database (e.g. PostgreSQL) when a team outgrows one machine. Every method is async for
 * that reason, although the SQLite store answers synchronously inside.
 *
 * Every save is a new revision holding the full document; nothing is ever overwritten. Deleting a
 * show moves it to the bin, from which it can be restored.
 */
import type { PlotDocument } from '@/lib/plot';

/** Show ids look like `sh-` and 16 base-36 characters; anything else is never looked up. */
export const SHOW_ID_PATTERN = /^sh-[a-z0-9]{16}$/;

/** One show as listed: its head revision and when it was last saved (ISO 8601 UTC). */
export interface ShowSummary {
  readonly id: string;
  readonly name: string;
  readonly venue: string;
  readonly revision: number;
  readonly createdAt: string;
  readonly updatedAt: string;
  /** When it was moved to the bin; null while it is not in the bin. */
  readonly deletedAt: string | null;
}

/** A show with the document of its head revision. */
export interface StoredShow extends ShowSummary {
  readonly document: PlotDocument;
}

/** One revision as listed, newest first: when it was saved and what changed from the one before. */
export interface RevisionSummary {
  readonly revision: number;
  readonly savedAt: string;
  /** The show's name in that revision. */
  readonly name: string;
  /** A short account of the change, e.g. "3 fixtures moved, 1 added". */
  readonly summary: string;
  /** The revision this one restored, or null for an ordinary save. */
  readonly restoredFrom: number | null;
}

/** A revision with its document. */
export interface StoredRevision extends RevisionSummary {
  readonly showId: string;
  readonly document: PlotDocument;
}

/** How a show came to be, recorded in its first revision's summary. */
export type ShowOrigin = 'created' | 'imported' | 'demo' | 'copy';

export type SaveResult =
  | { readonly ok: true; readonly revision: number; readonly unchanged: boolean; readonly savedAt: string }
  | { readonly ok: false; readonly reason: 'not-found' }
  | { readonly ok: false; readonly reason: 'in-bin'; readonly currentRevision: number }
  | { readonly ok: false; readonly reason: 'conflict'; readonly currentRevision: number };

export type RestoreResult =
  | { readonly ok: true; readonly revision: number }
  | { readonly ok: false; readonly reason: 'not-found' | 'in-bin' };

export interface ShowStore {
  /** Shows not in the bin (or, with `inBin`, only those in the bin), most recently saved first. */
  listShows(options?: { inBin?: boolean }): Promise<ShowSummary[]>;
  /** Store a new show; its first revision is 1. */
  createShow(document: PlotDocument, origin?: ShowOrigin): Promise<StoredShow>;
  /** The show with its head revision's document, or null if there is no such show (binned ones too). */
  getShow(id: string): Promise<StoredShow | null>;
  /**
   * Save a new revision on top of `baseRevision`. Refused with `conflict` (and nothing written) when
   * the head has moved on since; a document equal to the head's is not stored again (`unchanged`).
   */
  saveShow(id: string, baseRevision: number, document: PlotDocument): Promise<SaveResult>;
  /** Every revision of a show, newest first; null if there is no such show. */
  listRevisions(id: string): Promise<RevisionSummary[] | null>;
  /** One revision with its document, or null. */
  getRevision(id: string, revision: number): Promise<StoredRevision | null>;
  /** Make an old revision's document the head again, as a new revision (nothing is deleted). */
  restoreRevision(id: string, revision: number): Promise<RestoreResult>;
  /** Move a show to the bin; false if there is no such show. Already binned: true, no change. */
  moveToBin(id: string): Promise<boolean>;
  /** Take a show out of the bin; false if there is no such show. */
  restoreFromBin(id: string): Promise<boolean>;
  /** Number of shows, binned ones included (used to seed the demos into an empty store). */
  countShows(): Promise<number>;
  close(): Promise<void>;
}
