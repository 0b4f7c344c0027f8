// Child process for the crash test: saves revisions of one show in a loop and prints
// `ack <revision>` after each save has returned (the point at which a client is told "saved").
// Usage: tsx saveLoop.ts <database file> <show id>. Stops by itself after 30 s in case it is orphaned.
import { openSqliteShowStore } from '@/lib/storage/sqliteShowStore';

async function main(): Promise<void> {
  const [file, showId] = process.argv.slice(2);
  const store = openSqliteShowStore(file);
  const show = await store.getShow(showId);
  if (!show) throw new Error(`no show ${showId}`);
  let revision = show.revision;
  const stopAt = Date.now() + 30_000;
  while (Date.now() < stopAt) {
    const document = { ...show.document, notes: `saved as revision ${revision + 1}` };
    const result = await store.saveShow(showId, revision, document);
    if (!result.ok) throw new Error(`save refused: ${result.reason}`);
    revision = result.revision;
    process.stdout.write(`ack ${revision}\n`);
  }
}

main().catch((error: unknown) => {
  process.stderr.write(`${String(error)}\n`);
  process.exit(1);
});
