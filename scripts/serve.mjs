// Serves the production build: on 127.0.0.1 unless THROWLINE_HOST says otherwise, and never on
// another address without THROWLINE_TOKEN (every API call must then carry the token). PORT sets
// the port (default 3000). Forwards SIGINT/SIGTERM to the server so it stops cleanly.
import { spawn } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const host = process.env.THROWLINE_HOST?.trim() || '127.0.0.1';
const port = process.env.PORT?.trim() || '3000';
const loopback = host === '127.0.0.1' || host === 'localhost' || host === '::1';

if (!loopback && !process.env.THROWLINE_TOKEN?.trim()) {
  console.error(
    `Refusing to serve on ${host} without an access token: set THROWLINE_TOKEN to a long random secret ` +
      '(every API call and page then needs it), or leave THROWLINE_HOST unset to serve on 127.0.0.1 only.',
  );
  process.exit(2);
}

const nextBin = path.join(repoRoot, 'node_modules', '.bin', 'next');
const server = spawn(nextBin, ['start', '-H', host, '-p', port], { cwd: repoRoot, stdio: 'inherit' });
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => server.kill(signal));
server.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
