import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { savePlotText } from '@/lib/plot';
import { parseCsv } from '@/lib/plot/csv';
import { tinyPlot } from '../lib/plot/tinyPlot';

const tsx = path.join('node_modules', '.bin', 'tsx');
function report(...args: string[]) {
  return spawnSync(tsx, ['scripts/report.ts', ...args], { encoding: 'utf8' });
}

describe('npm run report -- file --csv DIR', () => {
  const folder = mkdtempSync(path.join(tmpdir(), 'throwline-csv-'));
  const good = path.join(folder, 'tiny.json');
  const plot = tinyPlot();
  plot.fixtures[0].purpose = 'Box "A", 上手';
  writeFileSync(good, savePlotText(plot));

  it('creates the folder, writes schedule.csv, focus-chart.csv and power.csv, and says so', () => {
    const target = path.join(folder, 'new', 'sheets');
    const run = report(good, '--csv', target);
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    expect(run.stdout).toContain(`Wrote ${path.join(target, 'schedule.csv')}: fixture schedule, 1 unit`);
    expect(run.stdout).toContain(`Wrote ${path.join(target, 'focus-chart.csv')}: focus chart, 1 unit`);
    expect(run.stdout).toContain(`Wrote ${path.join(target, 'power.csv')}: power sheet, 0 listed circuits`);
    const power = parseCsv(readFileSync(path.join(target, 'power.csv'), 'utf8'));
    expect(power[0][0]).toBe('Row');
    const schedule = parseCsv(readFileSync(path.join(target, 'schedule.csv'), 'utf8'));
    expect(schedule[1].slice(0, 4)).toEqual(['Front pipe', '1', 'Profile 26°', 'Box "A", 上手']);
    const focus = parseCsv(readFileSync(path.join(target, 'focus-chart.csv'), 'utf8'));
    // Throw √35.36 = 5.946 m (Pythagoras, as in the report test).
    expect(focus[1][focus[0].indexOf('Throw (m)')]).toBe('5.946');
  }, 30000);

  it('a folder that cannot be made gives one clear line and status 1, no stack trace', () => {
    const blocker = path.join(folder, 'a-file');
    writeFileSync(blocker, 'not a folder');
    const run = report(good, '--csv', path.join(blocker, 'inside'));
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/a-file[/\\]inside: cannot create the folder \(E[A-Z]+\)/);
    expect(run.stderr).not.toMatch(/\n\s+at /);
    expect(report(good, '--csv').stderr).toMatch(/--csv needs a folder/);
  }, 30000);
});
