import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { artifactsDir, recordPageProblems, browserForThisFile } from './support/browser';
import { createShowFromDemo, showUrl } from './support/shows';

const browser = browserForThisFile();

async function readout(page: Page, name: string): Promise<number> {
  return Number(await page.locator(`[data-readout="${name}"]`).first().getAttribute('data-value'));
}

describe('balancing the interview demo in a real browser', () => {
  it('the host fill is called fill, then 2:1 at the camera’s exposure is applied, read back, and undone', async () => {
    const page = await browser().newPage({ viewport: { width: 1440, height: 1000 } });
    const problems = recordPageProblems(page);
    const id = await createShowFromDemo(inject('baseUrl'), 'interview.json');
    await page.goto(showUrl(inject('baseUrl'), id), { waitUntil: 'load' });
    await page.getByTestId('plan-canvas').locator('canvas').first().waitFor({ state: 'visible' });
    await mkdir(artifactsDir, { recursive: true });

    // Pick the host in the lists; the subject panel shows the light on their face.
    await page
      .getByRole('listbox', { name: /Subjects/ })
      .getByRole('option', { name: 'Host', exact: true })
      .click();
    await page.locator('[data-readout="subjectKey"]').waitFor();
    const keyBefore = await readout(page, 'subjectKey');

    // By the rule the host's fill frame, on the key's side of Cam A, is "key": the user calls it fill.
    const fillRole = page.getByRole('combobox', { name: 'Role of Host fill stand #1' });
    expect(await fillRole.inputValue()).toBe('');
    expect(await fillRole.locator('option:checked').innerText()).toBe('by rule (key)');
    await fillRole.selectOption('fill');
    await expect.poll(() => readout(page, 'subjectKey')).toBeLessThan(keyBefore);
    const keyWithFix = await readout(page, 'subjectKey');
    await page.screenshot({ path: path.join(artifactsDir, 'balance-subject-before.png') });

    // Balance: the host is ticked (selected), the key light is Cam A's exposure, the ratio 2:1.
    await page.getByRole('tab', { name: 'Balance' }).click();
    const panel = page.getByTestId('balance-panel');
    expect(await panel.getByRole('checkbox', { name: 'Host', exact: true }).isChecked()).toBe(true);
    expect(await panel.getByRole('checkbox', { name: 'Guest', exact: true }).isChecked()).toBe(false);
    await panel.getByLabel('Key light', { exact: true }).selectOption('camera:vp-cam-a');
    await panel.getByLabel('Key : fill given as').selectOption('lighting');
    await panel.getByLabel('Lighting ratio').fill('2:1');
    await panel.getByRole('row', { name: /Host key stand #1/ }).waitFor();
    expect(await panel.innerText()).toContain('Every target is met within 0.05 stops.');
    await panel.screenshot({ path: path.join(artifactsDir, 'balance-panel.png') });
    await panel.getByRole('button', { name: 'Apply these levels' }).click();
    await panel.getByRole('button', { name: 'The units are at these levels' }).waitFor();

    // Back in the subject panel: the key side is at the camera's exposure, key = fill (2:1).
    await page.getByRole('tab', { name: 'Selected item' }).click();
    await page.locator('[data-readout="keyExposureStops"]').waitFor();
    // Levels are rounded to 0.1 %: within 0.05 stops of the camera's exposure and of key = fill.
    expect(Math.abs(await readout(page, 'keyExposureStops'))).toBeLessThan(0.05);
    expect(Math.abs(await readout(page, 'keyToFillStops'))).toBeLessThan(0.05);
    const ratioText = await page.locator('[data-readout="keyToFillStops"]').innerText();
    expect(ratioText).toContain('lighting ratio 2.0:1');
    expect(ratioText).toMatch(/\+1\.0\d stops between the lit and the shaded side|\+0\.9\d stops between/);
    expect(await page.locator('[data-readout="keyExposureStops"]').innerText()).toContain('needs 250 lx');
    await page.screenshot({ path: path.join(artifactsDir, 'balance-subject-after.png') });

    // One undo puts every level back.
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => readout(page, 'subjectKey')).toBeCloseTo(keyWithFix, 6);

    // A key light out of reach: the panel says so with the throw that would reach it.
    await page.getByRole('tab', { name: 'Balance' }).click();
    // The panel kept its choices while another tab was shown.
    expect(await panel.getByLabel('Key light', { exact: true }).inputValue()).toBe('camera:vp-cam-a');
    expect(await panel.getByLabel('Lighting ratio').inputValue()).toBe('2:1');
    await panel.getByLabel('Key light', { exact: true }).selectOption('number');
    const lux = panel.getByLabel(/^Key light \(lx\)/);
    await lux.fill('3000');
    await lux.press('Enter');
    const alert = panel.getByRole('alert');
    await alert.waitFor();
    expect(await alert.innerText()).toMatch(/at 100 % gives .* lx; to give .* lx move it to a throw of/);
    await panel.screenshot({ path: path.join(artifactsDir, 'balance-out-of-reach.png') });

    expect(problems.pageErrors).toEqual([]);
    expect(problems.consoleErrors).toEqual([]);
    await page.close();
  });
});
