import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { PlotEditor } from '@/components/editor/PlotEditor';
import { loadPlotText } from '@/lib/plot';

/** The demo a first visit opens: the studio theatre play. */
const FIRST_DEMO = 'studio-theatre.json';

export default async function HomePage() {
  const text = await readFile(path.join(process.cwd(), 'public', 'demo', FIRST_DEMO), 'utf8');
  const loaded = loadPlotText(text);
  if (!loaded.ok) {
    return (
      <main className="app-error">
        <h1>Throwline</h1>
        <p>The demo plot could not be opened:</p>
        <ul>
          {loaded.errors.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
      </main>
    );
  }
  return <PlotEditor initialDocument={loaded.document} />;
}
