import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { createCoverageService } from '@/lib/analysis';
import { createPlotDeriver, loadPlotValue } from '@/lib/plot';
import { DEFAULT_COVERAGE, coverageRequest } from '@/components/coverage/coverageSettings';
import { artifactsDir, recordPageProblems, browserForThisFile } from './support/browser';
import { createShowFromDemo, readDemo, showUrl } from './support/shows';

const browser = browserForThisFile();

/** The same light map computed here, in Node, on the main thread: what the browser's worker must match. */
function expectedStatistics(document: unknown) {
  const loaded = loadPlotValue(document);
  if (!loaded.ok) throw new Error(loaded.errors.join('\n'));
  const request = coverageRequest(loaded.document, createPlotDeriver()(loaded.document), {
    ...DEFAULT_COVERAGE,
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
