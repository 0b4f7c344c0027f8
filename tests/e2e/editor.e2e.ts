import { readFileSync } from 'node:fs';
import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { artifactsDir, recordPageProblems, browserForThisFile } from './support/browser';
import { createShowFromDemo, showUrl } from './support/shows';

const demo = JSON.parse(
  readFileSync(
    path.resolve(import.meta.dirname, '..', '..', 'public', 'demo', 'studio-theatre.json'),
    'utf8',
  ),
);
const special = demo.fixtures.find((unit: { id: string }) => unit.id === 'fx-7');

/** Open a fresh stored copy of the studio-theatre demo in the editor (edits are autosaved to it). */
async function openStudioTheatre(page: Page): Promise<void> {
  const id = await createShowFromDemo(inject('baseUrl'), 'studio-theatre.json');
  await page.goto(showUrl(inject('baseUrl'), id), { waitUntil: 'load' });
}

const browser = browserForThisFile();

interface View {
  left: number;
  top: number;
  scale: number;
  originX: number;
  originY: number;
}

async function planView(page: Page): Promise<View> {
  const plan = page.getByTestId('plan-canvas');
  const box = await plan.boundingBox();
  if (!box) throw new Error('no plan on the page');
  return {
    left: box.x,
    top: box.y,
    scale: Number(await plan.getAttribute('data-view-scale')),
    originX: Number(await plan.getAttribute('data-view-origin-x')),
    originY: Number(await plan.getAttribute('data-view-origin-y')),
  };
}

/** Page coordinates of a plan point (the README's convention: audience at the bottom). */
function toPage(view: View, point: { x: number; y: number }) {
  return {
    x: view.left + view.originX + point.x * view.scale,
    y: view.top + view.originY - point.y * view.scale,
  };
}

/** The plan point under a page coordinate. */
function toPlan(view: View, at: { x: number; y: number }) {
  return {
    x: (at.x - view.left - view.originX) / view.scale,
    y: (view.originY - (at.y - view.top)) / view.scale,
  };
}

async function readout(page: Page, name: string): Promise<number> {
  return Number(await page.locator(`[data-readout="${name}"]`).first().getAttribute('data-value'));
}

async function readoutText(page: Page, name: string): Promise<string> {
  return (await page.locator(`[data-readout="${name}"]`).first().innerText()).trim();
}

describe('editing the demo plot in a real browser', () => {
  it('drag a focus point: throw, pool and centre level follow the photometry; undo restores them', async () => {
    const page = await browser().newPage({ viewport: { width: 1440, height: 900 } });
    const problems = recordPageProblems(page);
    await openStudioTheatre(page);
    await page.getByTestId('plan-canvas').locator('canvas').first().waitFor({ state: 'visible' });
    const view = await planView(page);

    // Select the FOH 2 special by clicking its glyph on the canvas.
    const mountAt = toPage(view, special.mount);
    await page.mouse.click(mountAt.x, mountAt.y);
    await page.locator('[data-readout="throw"]').waitFor();

    // Before: the throw is the straight distance mount → focus (Pythagoras, from the file itself).
    const throwBefore = Math.hypot(
      special.focus.x - special.mount.x,
      special.focus.y - special.mount.y,
      special.focus.z - special.mount.z,
    );
    expect(await readout(page, 'throw')).toBeCloseTo(throwBefore, 9);
    const centreBefore = await readout(page, 'centreIlluminance');
    const beamAngle = await readout(page, 'beamAngle');

    // Drag its focus handle 1 m stage left and 1.5 m downstage, landing on a whole pixel.
    const from = toPage(view, special.focus);
    const target = toPage(view, { x: special.focus.x + 1, y: special.focus.y - 1.5 });
    const landing = { x: Math.round(target.x), y: Math.round(target.y) };
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    for (let step = 1; step <= 8; step += 1) {
      await page.mouse.move(
        from.x + ((landing.x - from.x) * step) / 8,
        from.y + ((landing.y - from.y) * step) / 8,
      );
    }
    await page.mouse.up();
    const focus = { ...toPlan(view, landing), z: special.focus.z };

    // After: throw by Pythagoras; centre level by the inverse-square law from the level before.
    const throwAfter = Math.hypot(
      focus.x - special.mount.x,
      focus.y - special.mount.y,
      focus.z - special.mount.z,
    );
    await expect.poll(() => readout(page, 'throw')).toBeCloseTo(throwAfter, 6);
    expect(await readout(page, 'centreIlluminance')).toBeCloseTo(
      centreBefore * (throwBefore / throwAfter) ** 2,
      3,
    );

    // The pool on the focus plane by the tilted-cone formulas (REFERENCE-CHECKS §3):
    // near = h·tan(β − α), far = h·tan(β + α), with h the height above the plane.
    const h = special.mount.z - demo.focusPlaneHeightM;
    const plan = Math.hypot(focus.x - special.mount.x, focus.y - special.mount.y);
    const beta = Math.atan2(plan, special.mount.z - focus.z);
    const alpha = ((beamAngle / 2) * Math.PI) / 180;
    expect(await readout(page, 'poolNear')).toBeCloseTo(h * Math.tan(beta - alpha), 6);
    expect(await readout(page, 'poolFar')).toBeCloseTo(h * Math.tan(beta + alpha), 6);

    // Undo (Ctrl+Z) puts the focus back: the figures return exactly.
    await page.locator('body').click({ position: { x: 5, y: 880 } });
    await page.keyboard.press('Control+z');
    await expect.poll(() => readout(page, 'throw')).toBeCloseTo(throwBefore, 9);
    expect(await readout(page, 'centreIlluminance')).toBeCloseTo(centreBefore, 9);

    // The hover readout reads the light where the pointer is.
    await page.mouse.move(toPage(view, { x: 0, y: 3 }).x, toPage(view, { x: 0, y: 3 }).y);
    await expect.poll(() => page.getByTestId('hover-readout').innerText()).toMatch(/\d+ lx horizontal/);

    await mkdir(artifactsDir, { recursive: true });
    await page.screenshot({ path: path.join(artifactsDir, 'editor-selected.png') });
    expect(problems.pageErrors).toEqual([]);
    expect(problems.consoleErrors).toEqual([]);
    await page.close();
  });

  it('switching units shows feet and foot-candles; a bad value shows its message and changes nothing', async () => {
    const page = await browser().newPage({ viewport: { width: 1440, height: 900 } });
    const problems = recordPageProblems(page);
    await openStudioTheatre(page);
    await page.getByTestId('plan-canvas').locator('canvas').first().waitFor({ state: 'visible' });
    const view = await planView(page);
    const mountAt = toPage(view, special.mount);
    await page.mouse.click(mountAt.x, mountAt.y);
    await page.locator('[data-readout="throw"]').waitFor();
    const throwBefore = await readout(page, 'throw');

    await page.getByRole('button', { name: 'ft · fc' }).click();
    // 1 ft = 0.3048 m (NIST SP 811): the throw in feet and inches, the centre level in fc.
    const feet = throwBefore / 0.3048;
    const wholeFeet = Math.floor(Math.round(feet * 12) / 12);
    await expect.poll(() => readoutText(page, 'throw')).toContain(`${wholeFeet}'`);
    expect(await readoutText(page, 'centreIlluminance')).toMatch(/ fc$/);
    await mkdir(artifactsDir, { recursive: true });
    await page.screenshot({ path: path.join(artifactsDir, 'editor-imperial.png') });

    const mountY = page.getByLabel('Mount y');
    await mountY.fill('abc');
    await mountY.press('Enter');
    await expect.poll(() => page.getByRole('alert').first().innerText()).toMatch(/not a length/);
    expect(await readout(page, 'throw')).toBe(throwBefore);
    // The refused value left no history: one undo takes back the unit switch, and then there is nothing left.
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => readoutText(page, 'throw')).toMatch(/ m$/);
    expect(await page.getByRole('button', { name: 'Undo' }).isDisabled()).toBe(true);

    expect(problems.pageErrors).toEqual([]);
    expect(problems.consoleErrors).toEqual([]);
    await page.close();
  });
});

describe('a first-time task: hang a unit and aim it at a performer', () => {
  it('hangs a unit on LX 3 with the next unit number, aims it at Ilse and shows its throw, pool and level', async () => {
    const page = await browser().newPage({ viewport: { width: 1440, height: 900 } });
    const problems = recordPageProblems(page);
    await openStudioTheatre(page);
    await page.getByTestId('plan-canvas').locator('canvas').first().waitFor({ state: 'visible' });
    const view = await planView(page);
    const lx3 = demo.positions.find((position: { id: string }) => position.id === 'pos-lx3');
    const ilse = demo.subjects.find((person: { id: string }) => person.id === 'sub-ilse');

    await page.getByRole('button', { name: 'Hang', exact: true }).click();
    await page.getByLabel('Type to hang').selectOption({ label: 'Profile 26°' });
    // Whole pixels: the browser reports pointer positions in whole CSS pixels.
    const pipeAt = toPage(view, { x: -1.3, y: lx3.shape.start.y });
    const onPipe = { x: Math.round(pipeAt.x), y: Math.round(pipeAt.y) };
    await page.mouse.click(onPipe.x, onPipe.y);

    // The new unit is the fourth on LX 3 (units 1–3 are there already), and it is selected.
    await expect.poll(() => page.locator('.editor-inspector h2').first().innerText()).toContain('LX 3 #4');
    await page.getByRole('button', { name: 'Select', exact: true }).click();

    // Drag its focus point onto Ilse's mark.
    const mountPlan = toPlan(view, onPipe);
    const focusPlanY = lx3.shape.start.y - (lx3.heightM - 0.4 - demo.focusPlaneHeightM); // first focus: 45° toward the stage
    const from = toPage(view, { x: mountPlan.x, y: focusPlanY });
    const target = toPage(view, ilse.mark);
    const landing = { x: Math.round(target.x), y: Math.round(target.y) };
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    await page.mouse.move((from.x + landing.x) / 2, (from.y + landing.y) / 2);
    await page.mouse.move(landing.x, landing.y);
    await page.mouse.up();

    const focus = toPlan(view, landing);
    const mount = { x: mountPlan.x, y: lx3.shape.start.y, z: lx3.heightM - 0.4 };
    const expectedThrow = Math.hypot(focus.x - mount.x, focus.y - mount.y, demo.focusPlaneHeightM - mount.z);
    await expect.poll(() => readout(page, 'throw')).toBeCloseTo(expectedThrow, 6);
    const centre = await readout(page, 'centreIlluminance');
    expect(Number.isFinite(centre) && centre > 0).toBe(true);
    expect(await readout(page, 'poolWidth')).toBeGreaterThan(0);
    expect(await page.getByRole('option', { name: /^LX 3 #4/ }).count()).toBe(1);

    await mkdir(artifactsDir, { recursive: true });
    await page.screenshot({ path: path.join(artifactsDir, 'editor-hung.png') });
    expect(problems.pageErrors).toEqual([]);
    expect(problems.consoleErrors).toEqual([]);
    await page.close();
  });
});
