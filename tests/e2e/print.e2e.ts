import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { artifactsDir, recordPageProblems, browserForThisFile } from './support/browser';
import { createShowFromDemo, readDemo, showUrl } from './support/shows';
import { loadPlotText } from '@/lib/plot';
import { parseCsv } from '@/lib/plot/csv';

const browser = browserForThisFile();

/** Width of a printable area in CSS px (96 px per inch): paper minus the two 12 mm margins. */
const printableWidthPx = (paperMm: number) => Math.round(((paperMm - 24) / 25.4) * 96);

/** The MediaBox sizes of a PDF's pages, in points (Chromium writes them uncompressed). */
function mediaBoxes(pdf: Buffer): [number, number][] {
  const text = pdf.toString('latin1');
  return [...text.matchAll(/\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/g)].map((match) => [
    Math.round(Number(match[1])),
    Math.round(Number(match[2])),
  ]);
}

async function openPrint(page: Page, url: string): Promise<void> {
  await page.goto(url, { waitUntil: 'load' });
  await page.getByTestId('title-block').first().waitFor();
}

describe('print view', () => {
  it('prints the conference demo: title block, plan, every fixture on the schedule and the focus chart', async () => {
    const baseUrl = inject('baseUrl');
    const demo = readDemo('conference.json');
    const id = await createShowFromDemo(baseUrl, 'conference.json');
    const page = await browser().newPage({ viewport: { width: printableWidthPx(210), height: 1000 } });
    const problems = recordPageProblems(page);
    await openPrint(page, new URL(`/shows/${id}/print?sheet=all&paper=a4`, baseUrl).toString());

    // Title block on each of the three sheets: the show, the venue, the stored revision (1: just made).
    const blocks = page.getByTestId('title-block');
    expect(await blocks.count()).toBe(3);
    const first = await blocks.first().innerText();
    expect(first).toContain(demo.name);
    expect(first).toContain(demo.venue);
    expect(first).toMatch(/Printed\s+\d{1,2} [A-Z][a-z]{2} \d{4}, \d\d:\d\d UTC/);
    expect(await page.getByTestId('title-revision').first().innerText()).toBe('1');

    // The schedule lists every fixture of the demo once; the focus chart has a card for each.
    const listed = await page
      .locator('.schedule-sheet tr[data-fixture-id]')
      .evaluateAll((rows) => rows.map((row) => row.getAttribute('data-fixture-id')));
    expect([...listed].sort()).toEqual(demo.fixtures.map((unit: { id: string }) => unit.id).sort());
    expect(await page.locator('.focus-card').count()).toBe(demo.fixtures.length);
    const firstUnit = demo.fixtures[0] as { purpose: string };
    expect(await page.locator('.schedule-sheet').innerText()).toContain(firstUnit.purpose);
    // The plan is drawn: one glyph group per unit plus positions.
    expect(await page.locator('svg.plan-drawing polygon').count()).toBeGreaterThan(demo.fixtures.length);

    // Print media: the toolbar goes; look at each sheet at its printed width.
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('.print-toolbar').isVisible()).toBe(false);
    mkdirSync(artifactsDir, { recursive: true });
    for (const name of ['plan', 'schedule', 'focus']) {
      if (name === 'plan')
        await page.setViewportSize({ width: Math.round(((297 - 20) / 25.4) * 96), height: 1000 });
      else await page.setViewportSize({ width: printableWidthPx(210), height: 1000 });
      const sheet = page.locator(`.print-sheet-${name}`);
      await sheet.screenshot({ path: path.join(artifactsDir, `print-${name}.png`) });
      // Nothing runs past the printable width.
      const overflow = await sheet.evaluate((element) => element.scrollWidth - element.clientWidth);
      expect(overflow).toBeLessThanOrEqual(0);
    }

    await page
      .locator('.focus-group')
      .first()
      .screenshot({ path: path.join(artifactsDir, 'print-focus-first.png') });

    // A4 PDF at the page's own sizes: the plan sheet landscape, the rest portrait (A4 = 595 × 842 pt).
    const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true });
    writeFileSync(path.join(artifactsDir, 'print-conference-a4.pdf'), pdf);
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const boxes = mediaBoxes(pdf);
    expect(boxes[0]).toEqual([842, 595]);
    expect(boxes.length).toBeGreaterThanOrEqual(3);
    expect(boxes.slice(1).every(([w, h]) => w === 595 && h === 842)).toBe(true);
    expect(problems).toEqual({ consoleErrors: [], pageErrors: [], failedRequests: [] });
    await page.close();
  });

  it('prints one sheet on Letter paper when asked (Letter = 612 × 792 pt)', async () => {
    const baseUrl = inject('baseUrl');
    const id = await createShowFromDemo(baseUrl, 'conference.json');
    const page = await browser().newPage();
    await openPrint(page, new URL(`/shows/${id}/print?sheet=focus&paper=letter`, baseUrl).toString());
    expect(await page.getByTestId('title-block').count()).toBe(1);
    expect(await page.locator('.print-sheet-focus').count()).toBe(1);
    const boxes = mediaBoxes(await page.pdf({ preferCSSPageSize: true }));
    expect(boxes.length).toBeGreaterThanOrEqual(1);
    expect(boxes.every(([w, h]) => w === 612 && h === 792)).toBe(true);
    await page.close();
  });

  it('prints the plan of a metric show on its own landscape sheet', async () => {
    const baseUrl = inject('baseUrl');
    const demo = readDemo('studio-theatre.json');
    const id = await createShowFromDemo(baseUrl, 'studio-theatre.json');
    const page = await browser().newPage({
      viewport: { width: Math.round(((297 - 20) / 25.4) * 96), height: 900 },
    });
    await openPrint(page, new URL(`/shows/${id}/print?sheet=plot&paper=a4`, baseUrl).toString());
    expect(await page.locator('.print-sheet').count()).toBe(1);
    expect(await page.getByTestId('title-block').innerText()).toContain(demo.name);
    expect(await page.getByTestId('title-block').innerText()).toContain('metres');
    // The scale bar is in metres for a metric show.
    expect(await page.locator('svg.plan-drawing').innerHTML()).toMatch(/>\d+ m</);
    await page.emulateMedia({ media: 'print' });
    mkdirSync(artifactsDir, { recursive: true });
    await page
      .locator('.print-sheet-plan')
      .screenshot({ path: path.join(artifactsDir, 'print-plan-studio.png') });
    expect(mediaBoxes(await page.pdf({ preferCSSPageSize: true }))).toEqual([[842, 595]]);
    await page.close();
  });
});

/** Width and height from a PNG's IHDR chunk (PNG spec: big-endian at bytes 16 and 20). */
function pngHeaderSize(bytes: Buffer): { width: number; height: number } {
  expect(bytes.subarray(1, 4).toString('latin1')).toBe('PNG');
  expect(bytes.subarray(12, 16).toString('latin1')).toBe('IHDR');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

describe('paperwork in the editor', () => {
  it('exports CSV and a PNG of the asked size, opens print, and refuses a bad plot file without change', async () => {
    const baseUrl = inject('baseUrl');
    const demo = readDemo('conference.json');
    const id = await createShowFromDemo(baseUrl, 'conference.json');
    const page = await browser().newPage({ viewport: { width: 1440, height: 900 }, acceptDownloads: true });
    const problems = recordPageProblems(page);
    await page.goto(showUrl(baseUrl, id), { waitUntil: 'load' });
    const canvas = page.getByTestId('plan-canvas');
    await canvas.locator('canvas').first().waitFor({ state: 'visible' });
    await page.getByText('Paperwork', { exact: true }).click();

    // The print view link carries the choices (the demo is in feet, so Letter is offered first).
    expect(await page.getByRole('link', { name: 'Open print view' }).getAttribute('href')).toBe(
      `/shows/${id}/print?sheet=all&paper=letter`,
    );

    // PNG at 4×: the file's header gives 4 × the canvas's CSS size, as the menu says.
    await page.getByLabel('Plan PNG at').selectOption('4');
    // The stage's size is that of its drawn <canvas> in CSS px (Konva sizes it to whole pixels).
    const box = await canvas
      .locator('canvas')
      .first()
      .evaluate((element) => ({ width: element.clientWidth, height: element.clientHeight }));
    const expected = { width: box.width * 4, height: box.height * 4 };
    expect(await page.getByTestId('png-size').innerText()).toContain(
      `${expected.width} × ${expected.height} px`,
    );
    const [png] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Save PNG' }).click(),
    ]);
    expect(pngHeaderSize(readFileSync(await png.path()))).toEqual(expected);
    mkdirSync(artifactsDir, { recursive: true });
    await png.saveAs(path.join(artifactsDir, 'editor-plan-4x.png'));

    // CSV of the schedule: every unit once, read back field by field.
    const [csv] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Fixture schedule (CSV)' }).click(),
    ]);
    const cells = parseCsv(readFileSync(await csv.path(), 'utf8'));
    const idColumn = cells[0].indexOf('Fixture id');
    expect(
      cells
        .slice(1)
        .map((row) => row[idColumn])
        .sort(),
    ).toEqual(demo.fixtures.map((unit: { id: string }) => unit.id).sort());
    const purposeColumn = cells[0].indexOf('Purpose');
    const first = cells.find((row) => row[idColumn] === demo.fixtures[0].id);
    expect(first?.[purposeColumn]).toBe(demo.fixtures[0].purpose);

    // The plot file saved from the editor loads back to the stored document, field for field.
    const [json] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Save plot file (.json)' }).click(),
    ]);
    const reloaded = loadPlotText(readFileSync(await json.path(), 'utf8'));
    const stored = (await (await fetch(new URL(`/api/shows/${id}`, baseUrl))).json()) as {
      document: unknown;
    };
    expect(reloaded.ok && reloaded.document).toEqual(stored.document);

    // A bad plot file: every problem with its path, and the plot is left as it was.
    const bad = structuredClone(demo);
    bad.fixtures[0].levelPct = 'full';
    await page.getByLabel('Open plot file…').setInputFiles({
      name: 'broken.json',
      mimeType: 'application/json',
      buffer: Buffer.from(JSON.stringify(bad)),
    });
    const alert = page.locator('.plot-import-problems');
    await alert.waitFor();
    expect(await alert.innerText()).toContain('fixtures[0].levelPct: must be a number');
    expect(await alert.innerText()).toContain('nothing was changed');
    expect(await page.locator('.editor-show').innerText()).toContain(demo.name);

    // A good file replaces the plot after asking; undo brings the old plot back.
    const other = readDemo('interview.json');
    page.once('dialog', (dialog) => void dialog.accept());
    await page.getByLabel('Open plot file…').setInputFiles({
      name: 'interview.json',
      mimeType: 'application/json',
      buffer: Buffer.from(JSON.stringify(other)),
    });
    await page.getByRole('button', { name: 'Replace this plot…' }).click();
    await expect.poll(() => page.locator('.editor-show').innerText()).toContain(other.name);
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => page.locator('.editor-show').innerText()).toContain(demo.name);

    // Nothing went wrong so far (the navigation below aborts requests of the page it leaves).
    expect(problems).toEqual({ consoleErrors: [], pageErrors: [], failedRequests: [] });

    // Or it opens as a new show through the import route, and the editor goes there.
    // (Pressing Undo outside the menu closed it: open it again.)
    await page.getByText('Paperwork', { exact: true }).click();
    await page.getByLabel('Open plot file…').setInputFiles({
      name: 'interview.json',
      mimeType: 'application/json',
      buffer: Buffer.from(JSON.stringify(other)),
    });
    await page.getByRole('button', { name: 'Open as a new show' }).click();
    await page.waitForURL(
      (url) => /^\/shows\/sh-[a-z0-9]{16}$/.test(url.pathname) && !url.pathname.endsWith(id),
    );
    await expect.poll(() => page.locator('.editor-show').innerText()).toContain(other.name);
    await page.goBack({ waitUntil: 'load' });
    await canvas.locator('canvas').first().waitFor({ state: 'visible' });
    await expect.poll(() => page.locator('.editor-show').innerText()).toContain(demo.name);

    // The schedule and focus chart views list every unit (the page was opened afresh: the menu is closed).
    await page.getByRole('tab', { name: 'Schedule' }).click();
    expect(await page.locator('.schedule-table tbody tr').count()).toBe(demo.fixtures.length);
    await page.screenshot({ path: path.join(artifactsDir, 'editor-schedule.png') });
    await page.getByRole('tab', { name: 'Focus chart' }).click();
    expect(await page.locator('.paperwork-view .focus-card').count()).toBe(demo.fixtures.length);
    await page.screenshot({ path: path.join(artifactsDir, 'editor-focus.png') });
    await page.getByRole('tab', { name: 'Plan' }).click();
    await canvas.locator('canvas').first().waitFor({ state: 'visible' });
    expect(problems.pageErrors).toEqual([]);
    await page.close();
  });
});
