/**
 * The designer's part of the team story in Chromium, against the running app, worker and database:
 * start a design from the two-focus example, save revision 1, change a focal length, save revision 2,
 * and see both in the history with their bundles. The review story continues from these revisions.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { launchBrowser, signIn, type Browser } from './browser';

const EXPORT_WAIT_MS = 280_000;
let browser: Browser;
let page: Page;

beforeAll(async () => {
  browser = await launchBrowser();
  page = await browser.newPage();
});
afterAll(async () => {
  await browser?.close();
});

/** Waits for the export of the revision just saved; the page shows its progress bar meanwhile. */
async function waitForBundle(number: number): Promise<void> {
  await page.getByTestId('build-done').filter({ hasText: `Revision ${number} saved` }).waitFor({ timeout: EXPORT_WAIT_MS });
}

async function replaceInEditor(from: string, to: string): Promise<void> {
  // Monaco keeps its text in a model; typing through the keyboard is what a designer does.
  const editor = page.locator('.monaco-editor').first();
  await editor.click();
  await page.keyboard.press('Control+F');
  await page.keyboard.type(from);
  await page.keyboard.press('Escape');
  await page.keyboard.type(to);
}

describe('designer saves two revisions of the two-focus example', () => {
  it('starts a design from the example and sees its mask', async () => {
    await signIn(page, 'designer@example.com');
    await page.goto('/designs');
    await page.getByRole('button', { name: /Start a design from the example Two off-axis foci/ }).click();
    await page.waitForURL(/\/designs\/[0-9a-f-]{36}$/);
    await expect.poll(() => page.getByTestId('check-status').innerText(), { timeout: 30_000 }).toBe('clean');
    // The live preview draws the zones and reports their figures.
    await page.getByTestId('mask-figures').waitFor({ timeout: 60_000 });
    const zones = Number(await page.getByTestId('mask-figures').locator('dd').first().innerText());
    expect(zones).toBeGreaterThan(10);
  }, 120_000);

  it('saves revision 1 and waits for its bundle', async () => {
    await page.getByLabel('Revision message').fill('First cut from the two-focus example');
    await page.getByRole('button', { name: 'Save revision' }).click();
    await page.getByTestId('build-progress').or(page.getByTestId('build-done')).first().waitFor();
    await waitForBundle(1);
  }, EXPORT_WAIT_MS + 20_000);

  it('changes a focal length, saves revision 2, and lists both in the history', async () => {
    await replaceInEditor('focal: 800 um', 'focal: 850 um');
    await expect.poll(() => page.getByTestId('draft-status').innerText(), { timeout: 20_000 }).toMatch(/Draft saved/);
    await page.getByLabel('Revision message').fill('Near focus moved to 850 µm');
    await page.getByRole('button', { name: 'Save revision' }).click();
    await waitForBundle(2);

    await page.getByRole('tab', { name: /History/ }).click();
    const rows = page.getByTestId('history').locator('tbody tr');
    await expect.poll(() => rows.count()).toBe(2);
    const first = await rows.nth(0).innerText();
    expect(first).toMatch(/^2\s/);
    expect(first).toContain('Near focus moved to 850 µm');
    expect(first).toContain('draft');
    expect(await rows.nth(1).innerText()).toContain('First cut from the two-focus example');

    // The revision page has the saved script and the bundle's checksum.
    await rows.nth(0).getByRole('link', { name: '2' }).click();
    await page.waitForURL(/\/revisions\/[0-9a-f-]{36}$/);
    await expect.poll(() => page.getByTestId('script-lines').innerText()).toContain('focal: 850 um');
    expect(await page.getByTestId('bundle-sha256').innerText()).toMatch(/^[0-9a-f]{64}$/);
  }, EXPORT_WAIT_MS + 60_000);
});
