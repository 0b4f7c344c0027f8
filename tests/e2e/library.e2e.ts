import { readFileSync } from 'node:fs';
import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { cosinePower, range, writeLm63 } from '../lib/formats/synthetic';
import { artifactsDir, recordPageProblems, browserForThisFile } from './support/browser';
import { createShowFromDemo, showUrl } from './support/shows';

const demo = JSON.parse(
  readFileSync(
    path.resolve(import.meta.dirname, '..', '..', 'public', 'demo', 'studio-theatre.json'),
    'utf8',
  ),
);
const special = demo.fixtures.find((unit: { id: string }) => unit.id === 'fx-7');

const browser = browserForThisFile();

/** Page coordinates of a plan point (audience at the bottom), from the plan's view attributes. */
async function pageAt(page: Page, point: { x: number; y: number }) {
  const plan = page.getByTestId('plan-canvas');
  const box = await plan.boundingBox();
  if (!box) throw new Error('no plan on the page');
  const scale = Number(await plan.getAttribute('data-view-scale'));
  const originX = Number(await plan.getAttribute('data-view-origin-x'));
  const originY = Number(await plan.getAttribute('data-view-origin-y'));
  return { x: box.x + originX + point.x * scale, y: box.y + originY - point.y * scale };
}

async function readout(page: Page, name: string): Promise<number> {
  return Number(await page.locator(`[data-readout="${name}"]`).first().getAttribute('data-value'));
}

/** The number at the start of a preview figure ("30.0°", "8,976 lm"). */
async function figure(page: Page, key: string): Promise<number> {
  const text = await page.locator(`.import-preview [data-figure="${key}"] dd`).innerText();
  return Number(text.replace(/,/g, '').match(/^[\d.]+/)?.[0]);
}

// A narrow spot, rotationally symmetric: I(γ) = I0·cos^n γ with I0 = 30 000 cd and n = 20, every 0.5°.
// Worked out from the formula [DER]: half the peak where cos^n γ = 0.5, so the beam angle is
// 2·acos(0.5^(1/n)) = 29.995°; a tenth where cos^n γ = 0.1, so the field angle is 2·acos(0.1^(1/n)) =
// 53.938°; and the flux is 2π·I0 ∫ cos^n γ sin γ dγ over 0…90° = 2π·I0/(n + 1) = 8976 lm.
const PEAK_CD = 30000;
const POWER = 20;
const BEAM_DEG = (2 * Math.acos(0.5 ** (1 / POWER)) * 180) / Math.PI;
const FIELD_DEG = (2 * Math.acos(0.1 ** (1 / POWER)) * 180) / Math.PI;
const LUMENS = (2 * Math.PI * PEAK_CD) / (POWER + 1);

describe('the fixture library in a real browser', () => {
  it('imports a measured LM-63 file, previews it, adds it as a type and gives it to a unit', async () => {
    expect(BEAM_DEG).toBeCloseTo(29.995, 3);
    expect(FIELD_DEG).toBeCloseTo(53.938, 3);
    expect(LUMENS).toBeCloseTo(8975.98, 1);

    const page = await browser().newPage({ viewport: { width: 1440, height: 900 } });
    const problems = recordPageProblems(page);
    const id = await createShowFromDemo(inject('baseUrl'), 'studio-theatre.json');
    await page.goto(showUrl(inject('baseUrl'), id), { waitUntil: 'load' });
    await page.getByTestId('plan-canvas').locator('canvas').first().waitFor({ state: 'visible' });

    await page.getByRole('button', { name: 'Fixture types' }).click();
    const dialog = page.getByRole('dialog', { name: 'Fixture types' });
    await dialog.waitFor();
    const text = writeLm63({
      vertical: range(0, 90, 0.5),
      horizontal: [0],
      intensity: cosinePower(PEAK_CD, POWER),
    });
    await dialog.getByLabel('Choose a photometric file').setInputFiles({
      name: 'narrow-spot.ies',
      mimeType: 'text/plain',
      buffer: Buffer.from(text, 'utf8'),
    });

    // The preview: a polar plot drawn as SVG curves, and the figures worked out above.
    const preview = page.getByRole('region', { name: 'Imported file preview' });
    await preview.waitFor();
    const plot = preview.locator('[data-polar-plot] svg');
    expect(await plot.count()).toBe(1);
    const curve = plot.locator('polyline[data-plane="C0–C180"]');
    const points = ((await curve.getAttribute('points')) ?? '').trim().split(/\s+/);
    expect(points.length).toBeGreaterThan(100);
    const curveBox = await curve.boundingBox();
    expect(curveBox && curveBox.width > 10 && curveBox.height > 10).toBe(true);
    expect(await figure(page, 'beamAngle')).toBeCloseTo(BEAM_DEG, 0);
    expect(Math.abs((await figure(page, 'beamAngle')) - BEAM_DEG)).toBeLessThanOrEqual(0.1);
    expect(Math.abs((await figure(page, 'fieldAngle')) - FIELD_DEG)).toBeLessThanOrEqual(0.1);
    expect(Math.abs((await figure(page, 'totalLumens')) / LUMENS - 1)).toBeLessThan(0.002);
    expect(await figure(page, 'peakCd')).toBe(PEAK_CD);

    await preview.getByLabel('Name').fill('Narrow spot (measured)');
    await preview.getByLabel('Category').selectOption('profile');
    await mkdir(artifactsDir, { recursive: true });
    await page.screenshot({ path: path.join(artifactsDir, 'library.png') });
    await preview.getByRole('button', { name: 'Add to the show' }).click();
    await dialog.getByText('Added Narrow spot (measured) to the show.').waitFor();
    // The new type's row shows its measured figures read-only, with the export of its file.
    const typeRow = dialog.locator('.type-row', { hasText: 'Narrow spot (measured)' });
    await typeRow.locator('summary').click();
    await typeRow.getByRole('button', { name: 'Export narrow-spot.ies' }).waitFor();
    expect(await typeRow.locator('[data-photometry="measured"] input').count()).toBe(0);
    await typeRow.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(artifactsDir, 'library-type.png') });
    await dialog.getByRole('button', { name: 'Close' }).click();
    await dialog.waitFor({ state: 'detached' });

    // Select the FOH 2 special and read its figures with its own zoom profile.
    const mountAt = await pageAt(page, special.mount);
    await page.mouse.click(mountAt.x, mountAt.y);
    await page.locator('[data-readout="beamAngle"]').waitFor();
    expect(await readout(page, 'beamAngle')).toBeCloseTo(special.zoomBeamDeg, 6);

    await page.getByLabel('Type', { exact: true }).selectOption({ label: 'Narrow spot (measured)' });
    await expect.poll(() => readout(page, 'beamAngle')).toBeCloseTo(BEAM_DEG, 1);
    expect(await readout(page, 'fieldAngle')).toBeCloseTo(FIELD_DEG, 1);

    // The pool on the focus plane by the tilted-cone formulas with the measured half-angle α:
    // near = h·tan(β − α), far = h·tan(β + α) from the mount height h above the plane (REFERENCE-CHECKS §3).
    const h = special.mount.z - demo.focusPlaneHeightM;
    const planDistance = Math.hypot(special.focus.x - special.mount.x, special.focus.y - special.mount.y);
    const beta = Math.atan2(planDistance, special.mount.z - special.focus.z);
    const alpha = ((BEAM_DEG / 2) * Math.PI) / 180;
    expect(Math.abs((await readout(page, 'poolNear')) - h * Math.tan(beta - alpha))).toBeLessThan(0.01);
    expect(Math.abs((await readout(page, 'poolFar')) - h * Math.tan(beta + alpha))).toBeLessThan(0.01);

    // The centre level: I0 × 75 % (linear dimming) over the throw squared, on a surface square to the beam.
    const throwM = Math.hypot(
      special.focus.x - special.mount.x,
      special.focus.y - special.mount.y,
      special.focus.z - special.mount.z,
    );
    expect((await readout(page, 'centreIlluminance')) / ((PEAK_CD * 0.75) / throwM ** 2)).toBeCloseTo(1, 3);

    await page.screenshot({ path: path.join(artifactsDir, 'library-unit.png') });
    expect(problems.pageErrors).toEqual([]);
    expect(problems.consoleErrors).toEqual([]);
    expect(problems.failedRequests).toEqual([]);
    await page.close();
  });
});
