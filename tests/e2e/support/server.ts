import { type ChildProcess, spawn, spawnSync } from 'node:child_process';
import { createServer } from 'node:net';
import path from 'node:path';

export const repoRoot = path.resolve(import.meta.dirname, '..', '..', '..');
const nextBin = path.join(repoRoot, 'node_modules', '.bin', 'next');
export const host = '127.0.0.1';
const startupTimeoutMs = 60_000;

/** A port nobody is listening on, on the loopback address. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.unref();
    probe.on('error', reject);
    probe.listen(0, host, () => {
      const address = probe.address();
      if (address === null || typeof address === 'string') {
        probe.close();
        reject(new Error('could not read the probe port'));
        return;
      }
      probe.close(() => resolve(address.port));
    });
  });
}

/** `next build` in the repository (the browser tests run against the production build). */
export function buildApp(): void {
  const result = spawnSync(nextBin, ['build'], { cwd: repoRoot, stdio: 'inherit', env: process.env });
  if (result.status !== 0) {
    throw new Error(`next build failed (exit ${result.status ?? result.signal})`);
  }
}

async function waitUntilAnswering(baseUrl: string, server: ChildProcess): Promise<void> {
  const deadline = Date.now() + startupTimeoutMs;
  while (Date.now() < deadline) {
    if (server.exitCode !== null || server.signalCode !== null) {
      throw new Error(`next start exited early (exit ${server.exitCode ?? server.signalCode})`);
    }
    try {
      const response = await fetch(baseUrl, { signal: AbortSignal.timeout(2_000) });
      await response.body?.cancel();
      return;
    } catch {
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
  }
  throw new Error(`next start did not answer at ${baseUrl} within ${startupTimeoutMs} ms`);
}

/** Stop a server started by startServer (SIGTERM, then SIGKILL after 5 s). */
export function stopServer(server: ChildProcess): Promise<void> {
  if (server.exitCode !== null || server.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const forceKill = setTimeout(() => server.kill('SIGKILL'), 5_000);
    server.once('exit', () => {
      clearTimeout(forceKill);
      resolve();
    });
    server.kill('SIGTERM');
  });
}

/** Serve the built app with `next start` on `port` using the show database `databaseFile`. */
export async function startServer(port: number, databaseFile: string): Promise<ChildProcess> {
  const baseUrl = `http://${host}:${port}`;
  const server = spawn(nextBin, ['start', '-H', host, '-p', String(port)], {
    cwd: repoRoot,
    stdio: ['ignore', 'inherit', 'inherit'],
    env: { ...process.env, NEXT_TELEMETRY_DISABLED: '1', THROWLINE_DB: databaseFile, THROWLINE_TOKEN: '' },
  });
  try {
    await waitUntilAnswering(baseUrl, server);
  } catch (error) {
    await stopServer(server);
    throw error;
  }
  return server;
}
