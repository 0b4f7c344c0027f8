import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { artifactsDir, recordPageProblems, browserForThisFile } from './support/browser';
import { freePort, host, startServer, stopServer } from './support/server';
import { createShowFromDemo, showUrl } from './support/shows';

const browser = browserForThisFile();

async function openEditor(page: Page, url: string): Promise<void> {
  await page.goto(url, { waitUntil: 'load' });
  await page.getByTestId('plan-canvas').locator('canvas').first().waitFor({ state: 'visible' });
}

/** Rename the show in the show settings (shown when nothing is selected). */
async function renameShow(page: Page, name: string): Promise<void> {
  const field = page.getByLabel('Show name');
  await field.fill(name);
  await field.press('Enter');
  await expect.poll(() => page.locator('.editor-show').innerText()).toContain(name);
}

async function saveState(page: Page): Promise<{ state: string | null; revision: number }> {
  const badge = page.getByTestId('save-state');
  return {
    state: await badge.getAttribute('data-save-state'),
    revision: Number(await badge.getAttribute('data-revision')),
  };
}

async function storedShow(baseUrl: string, id: string): Promise<{ revision: number; document: any }> {
  return (await (await fetch(new URL(`/api/shows/${id}`, baseUrl))).json()) as {
    revision: number;
    document: any;
  };
}

describe('shows saved on the server', () => {
  it('autosaves an edit as a new revision, and the edit is there after a reload', async () => {
    const baseUrl = inject('baseUrl');
    const id = await createShowFromDemo(baseUrl, 'studio-theatre.json');
    const page = await browser().newPage({ viewport: { width: 1440, height: 900 } });
    const problems = recordPageProblems(page);
    await openEditor(page, showUrl(baseUrl, id));
    expect(await saveState(page)).toEqual({ state: 'saved', revision: 1 });

    await renameShow(page, 'The Salt Ledger — autosaved');
    await expect.poll(() => saveState(page), { timeout: 10_000 }).toEqual({ state: 'saved', revision: 2 });
    const stored = await storedShow(baseUrl, id);
    expect(stored.revision).toBe(2);
    expect(stored.document.name).toBe('The Salt Ledger — autosaved');

    await page.reload({ waitUntil: 'load' });
    await page.getByTestId('plan-canvas').locator('canvas').first().waitFor({ state: 'visible' });
    expect(await page.locator('.editor-show').innerText()).toContain('The Salt Ledger — autosaved');
    expect(await saveState(page)).toEqual({ state: 'saved', revision: 2 });

    // The history page lists both revisions with what changed.
    await page.getByRole('link', { name: 'History' }).click();
    await page.waitForURL(`**/shows/${id}/history`);
    await expect.poll(() => page.locator('tr[data-revision="2"]').innerText()).toContain('show renamed');
    expect(await page.locator('tr[data-revision="1"]').innerText()).toContain('created from a demo');

    mkdirSync(artifactsDir, { recursive: true });
    await page.screenshot({ path: path.join(artifactsDir, 'shows-history.png') });
    // The content security policy lets the app run: nothing was blocked or thrown.
    expect(problems.pageErrors).toEqual([]);
    expect(problems.consoleErrors).toEqual([]);
    expect(problems.failedRequests).toEqual([]);
    await page.close();
  });

  it('a conflicting save is refused and offered back: saved on top, both revisions kept', async () => {
    const baseUrl = inject('baseUrl');
    const id = await createShowFromDemo(baseUrl, 'interview.json');
    const first = await browser().newPage({ viewport: { width: 1440, height: 900 } });
    const second = await browser().newPage({ viewport: { width: 1440, height: 900 } });
    await openEditor(first, showUrl(baseUrl, id));
    await openEditor(second, showUrl(baseUrl, id));

    await renameShow(first, 'Interview — first editor');
    await expect.poll(() => saveState(first), { timeout: 10_000 }).toEqual({ state: 'saved', revision: 2 });

    await renameShow(second, 'Interview — second editor');
    await expect.poll(async () => (await saveState(second)).state, { timeout: 10_000 }).toBe('conflict');
    const dialog = second.getByRole('alertdialog', { name: 'Save conflict' });
    expect(await dialog.innerText()).toContain('Revision 2 was saved since revision 1');
    expect((await storedShow(baseUrl, id)).document.name).toBe('Interview — first editor');

    mkdirSync(artifactsDir, { recursive: true });
    await second.screenshot({ path: path.join(artifactsDir, 'shows-conflict.png') });
    await dialog.getByRole('button', { name: 'Save mine as revision 3' }).click();
    await expect.poll(() => saveState(second), { timeout: 10_000 }).toEqual({ state: 'saved', revision: 3 });
    expect((await storedShow(baseUrl, id)).document.name).toBe('Interview — second editor');
    const revisions = (await (await fetch(new URL(`/api/shows/${id}/revisions`, baseUrl))).json()) as {
      revisions: { revision: number; name: string }[];
    };
    expect(revisions.revisions.map((entry) => [entry.revision, entry.name])).toEqual([
      [3, 'Interview — second editor'],
      [2, 'Interview — first editor'],
      [1, 'Kettle & Compass — guest interview set'],
    ]);
    await first.close();
    await second.close();
  });

  it('with the server stopped, an edit is kept in the browser and offered back after a restart', async () => {
    // A server of its own, so stopping it leaves the other tests' server alone.
    const dataDir = mkdtempSync(path.join(tmpdir(), 'throwline-e2e-offline-'));
    const databaseFile = path.join(dataDir, 'throwline.db');
    const port = await freePort();
    const baseUrl = `http://${host}:${port}`;
    let server = await startServer(port, databaseFile);
    const context = await browser().newContext({ viewport: { width: 1440, height: 900 } });
    try {
      const id = await createShowFromDemo(baseUrl, 'conference.json');
      const page = await context.newPage();
      await openEditor(page, showUrl(baseUrl, id));
      expect(await saveState(page)).toEqual({ state: 'saved', revision: 1 });

      await stopServer(server);
      await renameShow(page, 'Forum — edited offline');
      await expect.poll(async () => (await saveState(page)).state, { timeout: 10_000 }).toBe('offline');
      const kept = await page.evaluate((key) => window.localStorage.getItem(key), `throwline:unsaved:${id}`);
      expect(JSON.parse(kept ?? '{}').document?.name).toBe('Forum — edited offline');
      await page.close();

      server = await startServer(port, databaseFile);
      expect((await storedShow(baseUrl, id)).document.name).toBe('Urban Transit Forum — main stage');
      const reopened = await context.newPage();
      await openEditor(reopened, showUrl(baseUrl, id));
      const offer = reopened.getByRole('alertdialog', { name: 'Unsaved edits found' });
      await offer.waitFor({ state: 'visible' });
      expect(await offer.innerText()).toContain('made on revision 1');
      mkdirSync(artifactsDir, { recursive: true });
      await reopened.screenshot({ path: path.join(artifactsDir, 'shows-offline-offer.png') });

      await offer.getByRole('button', { name: 'Restore my unsaved edits' }).click();
      await expect
        .poll(() => reopened.locator('.editor-show').innerText())
        .toContain('Forum — edited offline');
      await expect
        .poll(() => saveState(reopened), { timeout: 10_000 })
        .toEqual({ state: 'saved', revision: 2 });
      expect((await storedShow(baseUrl, id)).document.name).toBe('Forum — edited offline');
      // Once the server has the edits, nothing is offered again.
      await reopened.reload({ waitUntil: 'load' });
      await reopened.getByTestId('plan-canvas').locator('canvas').first().waitFor({ state: 'visible' });
      expect(await reopened.getByRole('alertdialog').count()).toBe(0);
      await reopened.close();
    } finally {
      await context.close();
      await stopServer(server);
      rmSync(dataDir, { recursive: true, force: true });
    }
  });
});
