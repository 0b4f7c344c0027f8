import { readFileSync } from 'node:fs';
import path from 'node:path';
import { repoRoot } from './server';

/** A demo plot file from public/demo, parsed. */
export function readDemo(file: string): any {
  return JSON.parse(readFileSync(path.join(repoRoot, 'public', 'demo', file), 'utf8'));
}

/** Store a fresh copy of a demo on the server under test (so tests never edit each other's shows); its id. */
export async function createShowFromDemo(baseUrl: string, file: string): Promise<string> {
  const response = await fetch(new URL('/api/shows', baseUrl), {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ document: readDemo(file), origin: 'demo' }),
  });
  const body = (await response.json()) as { show?: { id: string }; error?: string };
  if (response.status !== 201 || !body.show) throw new Error(`could not create the show: ${body.error}`);
  return body.show.id;
}

/** The URL of the editor for a stored show. */
export function showUrl(baseUrl: string, id: string): string {
  return new URL(`/shows/${id}`, baseUrl).toString();
}
