/** First run: an empty store gets the demo shows from public/demo, studio theatre first in the list. */
import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import { loadPlotText } from '@/lib/plot';
import type { ShowStore } from './showStore';

/** The demo files, in the order they are seeded (the last seeded is listed first). */
export const DEMO_FILES = ['conference.json', 'interview.json', 'studio-theatre.json'] as const;

/**
 * Seed the demos into `store` if it holds no shows at all (binned ones count, so a user who binned
 * them does not get them back). Returns how many were added. A demo file that fails to load is an
 * error: it ships with the app and a test checks it.
 */
export async function seedDemos(store: ShowStore, demoDirectory: string): Promise<number> {
  if ((await store.countShows()) > 0) return 0;
  const present = new Set(await readdir(/*turbopackIgnore: true*/ demoDirectory));
  let added = 0;
  for (const file of DEMO_FILES) {
    if (!present.has(file)) continue;
    const loaded = loadPlotText(
      await readFile(
        /*turbopackIgnore: true*/ path.join(/*turbopackIgnore: true*/ demoDirectory, file),
        'utf8',
      ),
    );
    if (!loaded.ok) throw new Error(`demo ${file} does not load: ${loaded.errors.join('; ')}`);
    await store.createShow(loaded.document, 'demo');
    added += 1;
  }
  return added;
}
