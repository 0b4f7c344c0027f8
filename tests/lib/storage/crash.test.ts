import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { seededRandom } from '@/lib/seededRandom';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openSqliteShowStore } from '@/lib/storage/sqliteShowStore';
import { demoDocument } from './support/documents';

const repoRoot = path.resolve(import.meta.dirname, '..', '..', '..');
const loopScript = path.join(import.meta.dirname, 'support', 'saveLoop.ts');
const ROUNDS = 5;
const ROUND_TIMEOUT_MS = 20_000;

/** Run the save loop, kill it with SIGKILL `delayMs` after its first acknowledged save; the acks. */
function runAndKill(file: string, showId: string, delayMs: number): Promise<number[]> {
  return new Promise((resolve, reject) => {
    // `node --import tsx` runs the script in this very process, so SIGKILL reaches the saver itself
    // (the tsx command would start it as a grandchild that outlives the kill).
    const child: ChildProcess = spawn(process.execPath, ['--import', 'tsx', loopScript, file, showId], {
      cwd: repoRoot,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    let errors = '';
    let killTimer: ReturnType<typeof setTimeout> | null = null;
    const guard = setTimeout(() => {
      child.kill('SIGKILL');
      reject(new Error(`round did not finish in ${ROUND_TIMEOUT_MS} ms: ${errors}`));
    }, ROUND_TIMEOUT_MS);
    child.stdout?.on('data', (chunk: Buffer) => {
      output += chunk.toString('utf8');
      if (killTimer === null && output.includes('ack ')) {
        killTimer = setTimeout(() => child.kill('SIGKILL'), delayMs);
      }
    });
    child.stderr?.on('data', (chunk: Buffer) => (errors += chunk.toString('utf8')));
    child.on('exit', (code, signal) => {
      clearTimeout(guard);
      if (killTimer) clearTimeout(killTimer);
      if (signal !== 'SIGKILL') {
        reject(new Error(`the save loop ended by itself (exit ${code}): ${errors}`));
        return;
      }
      // Only whole lines count: a line cut off by the kill was never acknowledged.
      const acks = output
        .split('\n')
        .slice(0, -1)
        .map((line) => /^ack (\d+)$/.exec(line))
        .filter((match): match is RegExpExecArray => match !== null)
        .map((match) => Number(match[1]));
      resolve(acks);
    });
  });
}

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(path.join(tmpdir(), 'throwline-crash-'));
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

describe('a server killed while saving', () => {
  it(
    'reopens cleanly with every acknowledged revision intact, over 5 SIGKILLs at seeded moments',
    async () => {
      const file = path.join(dir, 'crash.db');
      const setupStore = openSqliteShowStore(file);
      const show = await setupStore.createShow(demoDocument());
      await setupStore.close();

      const random = seededRandom(20261201);
      let acknowledged: number[] = [];
      for (let round = 0; round < ROUNDS; round += 1) {
        const delayMs = 20 + Math.floor(random() * 400);
        const acks = await runAndKill(file, show.id, delayMs);
        expect(acks.length).toBeGreaterThan(0);
        acknowledged = [...acknowledged, ...acks];

        const check = new Database(file);
        expect(check.pragma('integrity_check', { simple: true })).toBe('ok');
        check.close();

        const store = openSqliteShowStore(file);
        const head = await store.getShow(show.id);
        expect(head).not.toBeNull();
        const highest = Math.max(...acknowledged);
        expect(head!.revision).toBeGreaterThanOrEqual(highest);
        const revisions = (await store.listRevisions(show.id))!.map((entry) => entry.revision);
        expect(revisions).toEqual(
          Array.from({ length: head!.revision }, (_, index) => head!.revision - index),
        );
        for (const revision of acks) {
          const stored = await store.getRevision(show.id, revision);
          expect(stored?.document.notes).toBe(`saved as revision ${revision}`);
        }
        await store.close();
      }
      // Acknowledged revisions are strictly increasing across rounds: none was handed out twice.
      expect(acknowledged).toEqual([...acknowledged].sort((a, b) => a - b));
      expect(new Set(acknowledged).size).toBe(acknowledged.length);
    },
    ROUNDS * ROUND_TIMEOUT_MS,
  );
});
