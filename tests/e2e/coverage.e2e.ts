import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { createCoverageService } from '@/lib/analysis';
import { createPlotDeriver, loadPlotValue } from '@/lib/plot';
import { DEFAULT_COVERAGE, coverageRequest } from '@/components/coverage/coverageSettings';
import { artifactsDir, recordPageProblems, browserForThisFile } from './support/browser';
import { createShowFromDemo, readDemo, showUrl } from './support/shows';
import { seededRandom } from '@/lib/seededRandom';

const browser = browserForThisFile();

/** The same light map computed here, in Node, on the main thread: what the browser's worker must match. */
function expectedStatistics(document: unknown, settings: Partial<typeof DEFAULT_COVERAGE> = {}) {
  const loaded = loadPlotValue(document);
  if (!loaded.ok) throw new Error(loaded.errors.join('\n'));
  const request = coverageRequest(loaded.document, createPlotDeriver()(loaded.document), {
    ...DEFAULT_COVERAGE,
    ...settings,
    visible: true,
  });
  if (typeof request === 'string') throw new Error(request);
  return createCoverageService().handle(request).statistics;
}

async function shownAverages(page: Page): Promise<Map<string, number>> {
  const rows = page.locator('[data-testid="coverage-statistics"] tbody tr');
  const result = new Map<string, number>();
  for (let index = 0; index < (await rows.count()); index += 1) {
    const row = rows.nth(index);
    result.set((await row.getAttribute('data-area')) ?? '', Number(await row.getAttribute('data-average')));
  }
  return result;
}

describe('the light map of the demo conference stage', () => {
  it('shows the map, statistics equal to the Node computation, hot spots and gaps, and follows a dragged unit', async () => {
    const page = await browser().newPage({ viewport: { width: 1440, height: 900 } });
    const problems = recordPageProblems(page);
    const demo = readDemo('conference.json');
    const id = await createShowFromDemo(inject('baseUrl'), 'conference.json');
    await page.goto(showUrl(inject('baseUrl'), id), { waitUntil: 'load' });
    await page.getByTestId('plan-canvas').locator('canvas').first().waitFor({ state: 'visible' });

    await page.getByRole('tab', { name: 'Light map' }).click();
    await page.getByLabel('Show the light map on the plan').check();
    await page.locator('[data-testid="coverage-statistics"]').waitFor();

    // The worker's figures equal the same service run here in Node (to 1e-9 relative).
    const expected = expectedStatistics(demo);
    const shown = await shownAverages(page);
    for (const row of expected) {
      expect(shown.get(row.id)).toBeCloseTo(row.figures?.averageLx ?? Number.NaN, 6);
    }
    expect(await page.locator('[data-testid="coverage-regions"] li').count()).toBeGreaterThan(0);
    // The worker compiled the WebAssembly SIMD loop (the page's content policy allows WebAssembly).
    expect(await page.getByTestId('coverage-timing').getAttribute('data-simd')).toBe('true');

    // Drag the second front-truss unit's focus point (alone at x 1, y 1.5) 1.5 m stage left: the figures follow.
    const plan = page.getByTestId('plan-canvas');
    const box = await plan.boundingBox();
    const scale = Number(await plan.getAttribute('data-view-scale'));
    const originX = Number(await plan.getAttribute('data-view-origin-x'));
    const originY = Number(await plan.getAttribute('data-view-origin-y'));
    if (!box) throw new Error('no plan');
    const unit = demo.fixtures[1];
    const from = { x: box.x + originX + unit.focus.x * scale, y: box.y + originY - unit.focus.y * scale };
    const to = { x: Math.round(from.x + 1.5 * scale), y: Math.round(from.y) };
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    for (let step = 1; step <= 10; step += 1)
      await page.mouse.move(from.x + ((to.x - from.x) * step) / 10, from.y);
    await page.mouse.up();
    // The editor autosaves the moved focus: read back exactly what it saved and compute that here.
    const saved = async () =>
      (await (await fetch(new URL(`/api/shows/${id}`, inject('baseUrl')))).json()) as {
        revision: number;
        document: { fixtures: { id: string; focus: { x: number; y: number } }[] };
      };
    await expect.poll(async () => (await saved()).revision, { timeout: 15000 }).toBeGreaterThan(1);
    const after = await saved();
    const focusAfter = after.document.fixtures.find((entry) => entry.id === unit.id)?.focus;
    // The unit went where the pointer went: 1.5 m stage left, to within a pixel.
    expect(Math.abs((focusAfter?.x ?? 0) - (unit.focus.x + 1.5))).toBeLessThan(1.5 / scale);
    const expectedAfter = expectedStatistics(after.document);
    const stage = expectedAfter.find((row) => row.id === 'stage')?.figures?.averageLx ?? Number.NaN;
    await expect
      .poll(async () => (await shownAverages(page)).get('stage'), { timeout: 10000 })
      .toBeCloseTo(stage, 6);

    await mkdir(artifactsDir, { recursive: true });
    await page.screenshot({ path: path.join(artifactsDir, 'light-map.png') });
    expect(problems.pageErrors).toEqual([]);
    expect(problems.consoleErrors).toEqual([]);
    await page.close();
  });
});

describe('a large rig', () => {
  it('computes its light map on the helper workers too, with the same figures as one thread in Node', async () => {
    // An invented rig: the conference demo's 21 units copied to 252, their focus points scattered.
    const demo = readDemo('conference.json');
    const next = seededRandom(42);
    const original = demo.fixtures as { id: string; focus: { x: number; y: number; z: number } }[];
    demo.fixtures = Array.from({ length: 12 * original.length }, (_, index) => {
      const fixture = original[index % original.length];
      return {
        ...fixture,
        id: `${fixture.id}-copy-${index}`,
        focus: {
          ...fixture.focus,
          x: fixture.focus.x + (next() - 0.5) * 3,
          y: fixture.focus.y + (next() - 0.5) * 2,
        },
      };
    });
    demo.levelSets = [];
    demo.activeLevelSetId = null;
    const response = await fetch(new URL('/api/shows', inject('baseUrl')), {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ document: demo, origin: 'file' }),
    });
    expect(response.status).toBe(201);
    const { show } = (await response.json()) as { show: { id: string } };

    const page = await browser().newPage({ viewport: { width: 1440, height: 900 } });
    const problems = recordPageProblems(page);
    await page.goto(showUrl(inject('baseUrl'), show.id), { waitUntil: 'load' });
    await page.getByTestId('plan-canvas').locator('canvas').first().waitFor({ state: 'visible' });
    await page.getByRole('tab', { name: 'Light map' }).click();
    await page.getByLabel('Show the light map on the plan').check();
    const timing = page.getByTestId('coverage-timing');
    await timing.waitFor();
    // Faces turned to the main viewpoint: a new grid, so every unit is computed again, and a 252-unit rig
    // is shared out with one helper per core beyond the first, at most three (useCoverage.ts).
    await page.getByLabel('Surface').selectOption('toward');
    const cores = await page.evaluate(() => navigator.hardwareConcurrency || 1);
    const threadsAndSimd = async () =>
      `${await timing.getAttribute('data-threads')} ${await timing.getAttribute('data-simd')}`;
    // Faces use the JavaScript loop (data-simd false), which tells this answer from the plane's.
    await expect.poll(threadsAndSimd, { timeout: 15000 }).toBe(`${Math.min(4, Math.max(1, cores))} false`);
    const expected = expectedStatistics(demo, { plane: 'toward' });
    const shown = await shownAverages(page);
    for (const row of expected)
      expect(shown.get(row.id)).toBeCloseTo(row.figures?.averageLx ?? Number.NaN, 6);

    // Back to the horizontal plane: shared again, and this worker and its helpers ran the SIMD loop.
    await page.getByLabel('Surface').selectOption('horizontal');
    await expect.poll(threadsAndSimd, { timeout: 15000 }).toBe(`${Math.min(4, Math.max(1, cores))} true`);
    const shownAgain = await shownAverages(page);
    for (const row of expectedStatistics(demo))
      expect(shownAgain.get(row.id)).toBeCloseTo(row.figures?.averageLx ?? Number.NaN, 6);
    await timing.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(artifactsDir, 'light-map-large-rig.png') });
    expect(problems.pageErrors).toEqual([]);
    expect(problems.consoleErrors).toEqual([]);
    await page.close();
  });
});
