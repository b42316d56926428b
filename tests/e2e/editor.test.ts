/**
 * The script editor in Debian's Chromium on the Language reference page: live markers from the
 * checker, completion of built-ins with signatures and units, and hover with an expression's type,
 * all with every request outside the app refused (the editor must work offline).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { APP_URL, launchBrowser, signIn, type Browser } from './browser';

let browser: Browser;
let page: Page;
const outside: string[] = [];

beforeAll(async () => {
  browser = await launchBrowser();
  const app = new URL(APP_URL);
  await browser.context.route('**/*', (route) => {
    const url = new URL(route.request().url());
    if (url.host === app.host || url.protocol === 'data:' || url.protocol === 'blob:') return route.continue();
    outside.push(url.href);
    return route.abort();
  });
  page = await browser.newPage();
  await signIn(page, 'designer@example.com');
  await page.goto('/reference');
  await page.locator('[data-testid="script-editor"] .monaco-editor .view-lines').waitFor();
});

afterAll(async () => {
  await browser?.close();
});

const status = () => page.getByTestId('try-it-status');

/** Puts the cursor at the end of the try-it script and types. */
async function typeAtEnd(text: string): Promise<void> {
  await page.locator('[data-testid="script-editor"] .view-lines').click();
  await page.keyboard.press('Control+End');
  await page.keyboard.type(text, { delay: 10 });
}

describe('script editor', () => {
  it('loads without any request leaving the app and checks the example clean', async () => {
    await expect.poll(() => status().innerText(), { timeout: 20_000 }).toBe('clean');
    expect(outside).toEqual([]);
  });

  it('shows a marker at a length/angle mix-up while typing', async () => {
    await typeAtEnd('\nmixed = 3 um + 2 deg\n');
    await expect.poll(() => status().innerText(), { timeout: 10_000 }).toMatch(/problem/);
    await page.locator('[data-testid="script-editor"] .squiggly-error').first().waitFor();
    const list = await page.locator('li').filter({ hasText: 'cannot add angle or phase (rad) to length (µm)' }).innerText();
    expect(list).toMatch(/^\d+:\d+ error/);
    for (let i = 0; i < 22; i++) await page.keyboard.press('Backspace');
    await expect.poll(() => status().innerText(), { timeout: 10_000 }).toBe('clean');
  });

  it('completes built-ins with their signature and units', async () => {
    await typeAtEnd('\nextra = paraxial_l');
    const widget = page.locator('.suggest-widget');
    await widget.waitFor({ state: 'visible' });
    await expect.poll(() => widget.innerText()).toContain('paraxial_lens');
    await page.keyboard.press('Control+Space');
    await expect.poll(() => page.locator('.suggest-details, .suggest-widget').allInnerTexts().then((t) => t.join(' '))).toContain('focal: length [nm, um, mm, m]');
    await page.keyboard.press('Escape');
  });

  it('shows the type and unit of an expression on hover', async () => {
    const number = page.locator('[data-testid="script-editor"] .view-line span span', { hasText: /^405$/ }).first();
    await number.hover();
    const hover = page.locator('.monaco-hover:not(.hidden)');
    await expect.poll(() => hover.innerText(), { timeout: 10_000 }).toContain('type: length (µm)');
  });
});
