import { readFileSync } from 'node:fs';
import path from 'node:path';
import { type PlotDocument, loadPlotText } from '@/lib/plot';

const demoDir = path.resolve(import.meta.dirname, '..', '..', '..', '..', 'public', 'demo');

/** A demo show from public/demo, loaded through the same checks as any file. */
export function demoDocument(file = 'studio-theatre.json'): PlotDocument {
  const loaded = loadPlotText(readFileSync(path.join(demoDir, file), 'utf8'));
  if (!loaded.ok) throw new Error(`demo ${file} does not load: ${loaded.errors.join('; ')}`);
  return loaded.document;
}

/** A copy of `document` with one fixture's mount moved `dx` metres across the stage. */
export function withFixtureMoved(document: PlotDocument, index: number, dx: number): PlotDocument {
  return {
    ...document,
    fixtures: document.fixtures.map((unit, at) =>
      at === index ? { ...unit, mount: { ...unit.mount, x: unit.mount.x + dx } } : unit,
    ),
  };
}
