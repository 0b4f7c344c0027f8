/**
 * The one store the server uses, opened on first use: SQLite at THROWLINE_DB (default
 * `data/throwline.db` under the directory the server runs in), created, migrated and seeded with the
 * demo shows when empty. To use another store, build it here (see DEVELOPERS.md).
 */
import path from 'node:path';
import { seedDemos } from './seedDemos';
import type { ShowStore } from './showStore';
import { openSqliteShowStore } from './sqliteShowStore';

/** The database file the server uses: THROWLINE_DB, or data/throwline.db under the working directory. */
export function databasePath(): string {
  const configured = process.env.THROWLINE_DB?.trim();
  return path.resolve(configured ? configured : path.join(process.cwd(), 'data', 'throwline.db'));
}

// Kept on globalThis so development reloads of this module do not open the file twice.
const holder = globalThis as typeof globalThis & { throwlineStore?: Promise<ShowStore> };

async function openServerStore(): Promise<ShowStore> {
  const store = openSqliteShowStore(databasePath());
  await seedDemos(store, path.join(process.cwd(), 'public', 'demo'));
  return store;
}

/** The server's store (opened, migrated and seeded on first call). */
export function getServerStore(): Promise<ShowStore> {
  if (!holder.throwlineStore) {
    holder.throwlineStore = openServerStore().catch((error: unknown) => {
      holder.throwlineStore = undefined;
      throw error;
    });
  }
  return holder.throwlineStore;
}

/** Close the server's store (tests; the next call to getServerStore opens it again). */
export async function closeServerStore(): Promise<void> {
  const pending = holder.throwlineStore;
  holder.throwlineStore = undefined;
  if (pending) await (await pending).close();
}
