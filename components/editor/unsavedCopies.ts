/**
 * Copies of a show's edits kept in the browser (localStorage) until the server has them. One
 * "pending" copy per show is rewritten before every save attempt and removed once the server
 * acknowledges that exact document; when a page opens and finds a pending copy the server does not
 * have, it moves it to the show's "recovered" list, which is offered back until the user restores or
 * discards each copy — so opening the editor again never overwrites one.
 */
import type { PlotDocument } from '@/lib/plot';

export interface UnsavedCopy {
  /** The server revision the edits were made on. */
  readonly baseRevision: number;
  /** When the copy was written, ISO 8601. */
  readonly keptAt: string;
  readonly document: PlotDocument;
}

/** The part of the Web Storage API used here (tests pass an in-memory one). */
export type CopyStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

const pendingKey = (showId: string) => `throwline:unsaved:${showId}`;
const recoveredKey = (showId: string) => `throwline:recovered:${showId}`;

function read<T>(storage: CopyStorage, key: string): T | null {
  try {
    const text = storage.getItem(key);
    return text === null ? null : (JSON.parse(text) as T);
  } catch {
    return null;
  }
}

/** Keep the pending copy; false if the browser refused (storage full or disabled). */
export function keepPendingCopy(storage: CopyStorage, showId: string, copy: UnsavedCopy): boolean {
  try {
    storage.setItem(pendingKey(showId), JSON.stringify(copy));
    return true;
  } catch {
    return false;
  }
}

export function readPendingCopy(storage: CopyStorage, showId: string): UnsavedCopy | null {
  return read<UnsavedCopy>(storage, pendingKey(showId));
}

export function dropPendingCopy(storage: CopyStorage, showId: string): void {
  try {
    storage.removeItem(pendingKey(showId));
  } catch {
    // Storage disabled: there is nothing to drop.
  }
}

/** Recovered copies waiting for the user's decision, newest first. */
export function readRecoveredCopies(storage: CopyStorage, showId: string): UnsavedCopy[] {
  const copies = read<UnsavedCopy[]>(storage, recoveredKey(showId));
  return Array.isArray(copies) ? copies : [];
}

export function writeRecoveredCopies(
  storage: CopyStorage,
  showId: string,
  copies: readonly UnsavedCopy[],
): boolean {
  try {
    if (copies.length === 0) storage.removeItem(recoveredKey(showId));
    else storage.setItem(recoveredKey(showId), JSON.stringify(copies));
    return true;
  } catch {
    return false;
  }
}
