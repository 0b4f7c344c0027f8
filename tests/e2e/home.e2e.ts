import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, inject, it } from 'vitest';
import { artifactsDir, recordPageProblems, browserForThisFile } from './support/browser';

const browser = browserForThisFile();

describe('home page', () => {
  it('lists the demo shows, opens the studio-theatre plot in one click, draws the stage plan, and logs no errors or failed requests', async () => {
    const page = await browser().newPage({ viewport: { width: 1280, height: 800 } });
    const problems = recordPageProblems(page);

    const response = await page.goto(inject('baseUrl'), { waitUntil: 'load' });
    expect(response?.status()).toBe(200);
    expect(await page.title()).toBe('Throwline — stage and studio lighting plots');

    // The start page lists the seeded demos; one click opens the studio theatre play. Other tests
    // store copies of it under the same name, so pick the seeded one: the oldest of that name.
    const listed = (await (await fetch(new URL('/api/shows', inject('baseUrl')))).json()) as {
      shows: { id: string; name: string; createdAt: string }[];
    };
    const seeded = listed.shows
      .filter((show) => show.name === 'The Salt Ledger — studio plot')
      .sort((a, b) => a.createdAt.localeCompare(b.createdAt))[0];
    expect(seeded).toBeDefined();
    await page.locator(`a[href="/shows/${seeded.id}"]`).click();
    await page.waitForURL(`**/shows/${seeded.id}`);
    expect(await page.locator('h1').innerText()).toBe('Throwline');

    expect(await page.getByText('The Salt Ledger — studio plot').first().isVisible()).toBe(true);
    const plan = page.getByRole('img', { name: /^Stage plan of The Salt Ledger/ });
    await plan.locator('canvas').first().waitFor({ state: 'visible' });
    const planBox = await plan.boundingBox();
    expect(planBox?.width).toBeGreaterThan(600);
    expect(planBox?.height).toBeGreaterThan(300);

    // Konva drew something: some pixels of the layer canvas are not transparent.
    const paintedPixels = await plan
      .locator('canvas')
      .first()
      .evaluate((canvas: HTMLCanvasElement) => {
        const context = canvas.getContext('2d');
        if (context === null) return 0;
        const { data } = context.getImageData(0, 0, canvas.width, canvas.height);
        let count = 0;
        for (let index = 3; index < data.length; index += 4) if (data[index] > 0) count += 1;
        return count;
      });
    expect(paintedPixels).toBeGreaterThan(1000);

    await mkdir(artifactsDir, { recursive: true });
    await page.screenshot({ path: path.join(artifactsDir, 'home.png'), fullPage: true });

    expect(problems.pageErrors).toEqual([]);
    expect(problems.consoleErrors).toEqual([]);
    expect(problems.failedRequests).toEqual([]);
    await page.close();
  });

  it('serves the app icon', async () => {
    const response = await fetch(new URL('/icon.svg', inject('baseUrl')));
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toContain('image/svg+xml');
  });
});
