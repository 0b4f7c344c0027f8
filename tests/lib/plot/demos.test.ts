import { readFileSync, readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildReport, loadPlotText } from '@/lib/plot';

const demoFiles = readdirSync('public/demo').filter((name) => name.endsWith('.json'));

describe('demo shows', () => {
  it('there is one for each kind of user', () => {
    expect(demoFiles.sort()).toEqual(['conference.json', 'interview.json', 'studio-theatre.json']);
  });

  it.each(demoFiles)('%s loads, validates, and every number in its report is finite', (name) => {
    const loaded = loadPlotText(readFileSync(`public/demo/${name}`, 'utf8'));
    if (!loaded.ok) throw new Error(loaded.errors.join('\n'));
    const document = loaded.document;
    expect(document.fixtures.length).toBeGreaterThan(3);
    expect(document.subjects.length).toBeGreaterThan(0);
    const report = buildReport(document);
    for (const fixture of report.fixtures) {
      expect(fixture.problem).toBeNull();
      expect(Number.isFinite(fixture.throwM)).toBe(true);
      expect(Number.isFinite(fixture.centreLx)).toBe(true);
    }
    for (const subject of report.subjects) {
      // Every demo subject is lit: more than 50 lx on the face toward the main viewpoint.
      expect(subject.totalFaceLx).toBeGreaterThan(50);
    }
  });
});
