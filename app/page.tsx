import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { type DemoChoice, StartPage } from '@/components/shows/StartPage';
import { SignIn } from '@/components/shows/SignIn';
import { loadPlotText } from '@/lib/plot';
import { DEMO_FILES } from '@/lib/storage/seedDemos';
import { getServerStore } from '@/lib/storage/serverStore';
import { pageHasAccess } from './pageAccess';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

async function demoChoices(): Promise<DemoChoice[]> {
  const choices: DemoChoice[] = [];
  for (const file of [...DEMO_FILES].reverse()) {
    try {
      const loaded = loadPlotText(
        await readFile(/*turbopackIgnore: true*/ path.join(process.cwd(), 'public', 'demo', file), 'utf8'),
      );
      if (loaded.ok) choices.push({ file, name: loaded.document.name });
    } catch {
      // A missing demo file is simply not offered.
    }
  }
  return choices;
}

/** The start page: the shows on this server, new from a demo, import, and the bin. */
export default async function HomePage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  if (!(await pageHasAccess())) return <SignIn failed={(await searchParams).signin === 'failed'} />;
  const store = await getServerStore();
  const [shows, bin, demos] = await Promise.all([
    store.listShows(),
    store.listShows({ inBin: true }),
    demoChoices(),
  ]);
  return <StartPage shows={shows} bin={bin} demos={demos} />;
}
