import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { savePlotText } from '@/lib/plot';
import { tinyPlot } from '../lib/plot/tinyPlot';

const tsx = path.join('node_modules', '.bin', 'tsx');
function report(...args: string[]) {
  return spawnSync(tsx, ['scripts/report.ts', ...args], { encoding: 'utf8' });
}

describe('npm run report', () => {
  const folder = mkdtempSync(path.join(tmpdir(), 'throwline-report-'));
  const good = path.join(folder, 'tiny.json');
  writeFileSync(good, savePlotText(tinyPlot()));

  it('prints the JSON report with the stable names', () => {
    const run = report(good, '--json');
    expect(run.status).toBe(0);
    const parsed = JSON.parse(run.stdout);
    expect(parsed.fixtures[0]).toMatchObject({ id: 'fx-1', unit: 1, position: 'Front pipe' });
    for (const key of ['throwM', 'panDeg', 'tiltDeg', 'beamDiameterM', 'fieldDiameterM', 'centreLx']) {
      expect(typeof parsed.fixtures[0][key]).toBe('number');
    }
    expect(Object.keys(parsed.fixtures[0].footprint).sort()).toEqual([
      'areaM2',
      'farM',
      'nearM',
      'open',
      'state',
      'widthM',
    ]);
    // Hand value from the report test: √35.36 m throw, 380.47 lx on the face.
    expect(parsed.fixtures[0].throwM).toBeCloseTo(5.946427, 6);
    expect(parsed.subjects[0]).toMatchObject({ id: 'sub-1', name: 'Ada' });
    expect(parsed.subjects[0].sources[0].faceLx).toBeCloseTo(380.471, 3);
    expect(parsed.coverage.areas[0]).toMatchObject({ id: 'stage', name: 'Whole stage' });
    expect(parsed.coverage.targetLx).toBe(500);
  }, 30000);

  it('prints a text report in imperial units when asked', () => {
    const run = report(good, '--units', 'imperial');
    expect(run.status).toBe(0);
    expect(run.stdout).toContain('fc');
    expect(run.stdout).toContain(`19' 6"`);
  }, 30000);

  it('a bad file prints every problem with its path and exits 1', () => {
    const bad = path.join(folder, 'bad.json');
    const plot = structuredClone(tinyPlot()) as unknown as { fixtures: { levelPct: unknown }[] };
    plot.fixtures[0].levelPct = 'full';
    writeFileSync(bad, JSON.stringify(plot));
    const run = report(bad);
    expect(run.status).toBe(1);
    expect(run.stderr).toContain('fixtures[0].levelPct: must be a number');
    expect(run.stdout).toBe('');
  }, 30000);

  it('a missing file and bad options are refused clearly', () => {
    expect(report(path.join(folder, 'none.json')).stderr).toMatch(/cannot read it \(ENOENT\)/);
    const wrong = report(good, '--units', 'cubits');
    expect(wrong.status).toBe(2);
    expect(wrong.stderr).toMatch(/--units must be metric or imperial/);
  }, 30000);
});
