import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { buildApp, freePort, host, startServer, stopServer } from './server';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

/**
 * Builds the app (unless THROWLINE_SKIP_BUILD=1), serves it on a free loopback port with a fresh
 * temporary show database (never a developer's own), provides its URL, and removes the database after.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  if (process.env.THROWLINE_SKIP_BUILD !== '1') buildApp();

  const dataDir = mkdtempSync(path.join(tmpdir(), 'throwline-e2e-'));
  const port = await freePort();
  const server = await startServer(port, path.join(dataDir, 'throwline.db'));

  project.provide('baseUrl', `http://${host}:${port}`);
  return async () => {
    await stopServer(server);
    rmSync(dataDir, { recursive: true, force: true });
  };
}
