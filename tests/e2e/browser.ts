/**
 * Shared helpers for browser tests: Debian's Chromium driven by playwright-core, against the app at
 * APP_URL (started by scripts/test.sh). Each launch gets a fresh profile folder, removed on close.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const APP_URL = (process.env.APP_URL ?? 'http://127.0.0.1:3100').replace(/\/+$/, '');
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
export const DEMO_PASSWORD = 'zonewright-demo';

const CHROMIUM_FLAGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
  '--disable-dev-shm-usage',
];

export interface Browser {
  context: BrowserContext;
  newPage(): Promise<Page>;
  close(): Promise<void>;
}

/** A headless Chromium with its own fresh user-data-dir; close() also removes the folder. */
export async function launchBrowser(): Promise<Browser> {
  const profile = mkdtempSync(path.join(os.tmpdir(), 'zw-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_FLAGS,
    baseURL: APP_URL,
    viewport: { width: 1280, height: 800 },
  });
  context.setDefaultTimeout(20_000);
  return {
    context,
    async newPage() {
      return context.newPage();
    },
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/**
 * Sign in through the real form with e-mail and password (the demo password by default) and wait
 * for the Desk. Leaves the page on /desk.
 */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  const form = page.getByRole('form', { name: 'Sign in with password' });
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Password').fill(password);
  await form.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/desk(\?|$)/);
}

/** The labels of the main navigation, in order. */
export async function navLabels(page: Page): Promise<string[]> {
  return page.getByRole('navigation', { name: 'Main' }).getByRole('link').allInnerTexts();
}
