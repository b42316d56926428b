/**
 * Signing in through the real pages in Debian's Chromium: each demo role sees the navigation its role
 * allows, a wrong password shows one clear message, the e-mail link arrives in the Mailbox and signs
 * the user in, and an invitation makes a new account that lands in the team.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { APP_URL, launchBrowser, navLabels, signIn, type Browser } from './browser';

// Written out by hand from the authorization table: Fab queue for those who release or record fab
// runs, New design for those who create designs; the rest for every member.
const EXPECTED_NAV: Record<string, string[]> = {
  owner: ['Desk', 'Designs', 'New design', 'Fab queue', 'Team', 'Language reference', 'Mailbox', 'Settings'],
  designer: ['Desk', 'Designs', 'New design', 'Team', 'Language reference', 'Mailbox', 'Settings'],
  reviewer: ['Desk', 'Designs', 'Fab queue', 'Team', 'Language reference', 'Mailbox', 'Settings'],
  fab: ['Desk', 'Designs', 'Fab queue', 'Team', 'Language reference', 'Mailbox', 'Settings'],
  viewer: ['Desk', 'Designs', 'Team', 'Language reference', 'Mailbox', 'Settings'],
};
const ROLE_TAG: Record<string, string> = { owner: 'Owner', designer: 'Designer', reviewer: 'Reviewer', fab: 'Fab', viewer: 'Viewer' };

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function freshPage(): Promise<Page> {
  const page = await browser.newPage();
  await browser.context.clearCookies();
  return page;
}

/** The newest message to `to` in the Mailbox, opened; returns the first link in its body. */
async function linkFromMailbox(page: Page, to: string, subject: RegExp): Promise<string> {
  for (let attempt = 0; attempt < 20; attempt++) {
    await page.goto('/mailbox');
    const row = page.getByRole('row').filter({ hasText: to }).filter({ hasText: subject }).first();
    if ((await row.count()) > 0) {
      await row.getByRole('link').click();
      await page.waitForURL(/\/mailbox\/[0-9a-f-]{36}$/);
      const href = await page.locator('pre a').first().getAttribute('href');
      if (href) return href;
    }
    await page.waitForTimeout(500);
  }
  throw new Error(`no mail to ${to} matching ${subject} arrived in the Mailbox`);
}

describe('sign-in in Chromium', () => {
  for (const role of Object.keys(EXPECTED_NAV)) {
    it(`${role} signs in through the form and sees the ${role}'s navigation`, async () => {
      const page = await freshPage();
      await signIn(page, `${role}@example.com`);
      expect(await navLabels(page)).toEqual(EXPECTED_NAV[role]);
      await expect(page.getByTestId('current-team').innerText()).resolves.toContain(ROLE_TAG[role]);
      const newDesignButton = page.getByRole('main').getByRole('link', { name: 'New design' });
      expect(await newDesignButton.count()).toBe(EXPECTED_NAV[role].includes('New design') ? 1 : 0);
      await page.close();
    });
  }

  it('shows one clear message for a wrong password and for an unknown address', async () => {
    const page = await freshPage();
    const messages: string[] = [];
    for (const [email, password] of [
      ['designer@example.com', 'not-the-password'],
      ['nobody-here@example.com', 'zonewright-demo'],
    ]) {
      await page.goto('/sign-in');
      const form = page.getByRole('form', { name: 'Sign in with password' });
      await form.getByLabel('E-mail').fill(email);
      await form.getByLabel('Password').fill(password);
      await form.getByRole('button', { name: 'Sign in' }).click();
      const alert = form.getByRole('alert');
      await alert.waitFor();
      messages.push(await alert.innerText());
      expect(new URL(page.url()).pathname).toBe('/sign-in');
    }
    expect(messages[0]).toBe('That e-mail and password do not match an account.');
    expect(messages[1]).toBe(messages[0]);
    await page.close();
  });

  it('sends a sign-in link to the Mailbox that signs the user in', async () => {
    const requester = await freshPage();
    await requester.goto('/sign-in');
    const form = requester.getByRole('form', { name: 'Sign in with an e-mail link' });
    await form.getByLabel('E-mail').fill('Reviewer@Example.com');
    await form.getByRole('button', { name: 'E-mail me a sign-in link' }).click();
    await requester.waitForURL(/\/sign-in\/check-mail/);

    // Someone else, signed in, reads the local Mailbox in a second browser.
    const reader = await launchBrowser();
    try {
      const mailPage = await reader.newPage();
      await signIn(mailPage, 'owner@example.com');
      const link = await linkFromMailbox(mailPage, 'reviewer@example.com', /sign-in link/i);
      expect(link.startsWith(`${APP_URL}/api/auth/callback/email`)).toBe(true);

      await requester.goto(link);
      await requester.waitForURL(/\/desk$/);
      await expect(requester.getByTestId('current-user').innerText()).resolves.toContain('demo reviewer');

      // The link works once.
      const again = await reader.newPage();
      await reader.context.clearCookies();
      await again.goto(link);
      await again.waitForURL(/\/sign-in/);
      await expect(again.getByRole('alert').first().innerText()).resolves.toContain('expired or was already used');
    } finally {
      await reader.close();
    }
    await requester.close();
  });

  it('lets an owner invite a newcomer who joins with the invited role', async () => {
    const email = `newcomer-${Date.now()}@example.com`;
    const owner = await freshPage();
    await signIn(owner, 'owner@example.com');
    await owner.goto('/team');
    const invite = owner.getByRole('form', { name: 'Invite by e-mail' });
    await invite.getByLabel('E-mail').fill(email);
    await invite.getByLabel('Role').selectOption('reviewer');
    await invite.getByRole('button', { name: 'Send invitation' }).click();
    await owner.getByText(`Invitation sent to ${email}.`).waitFor();
    const link = await linkFromMailbox(owner, email, /invited you/);

    const newcomerBrowser = await launchBrowser();
    try {
      const page = await newcomerBrowser.newPage();
      await page.goto(link);
      const accept = page.getByRole('form', { name: 'Accept the invitation' });
      await accept.getByLabel('Your name').fill('Newcomer (test)');
      await accept.getByLabel('Password', { exact: true }).fill('short');
      await accept.getByLabel('Password again').fill('short');
      await accept.getByRole('button', { name: 'Create account and join' }).click();
      await expect(accept.getByRole('alert').innerText()).resolves.toContain('at least 10 characters');
      await accept.getByLabel('Password', { exact: true }).fill('a-long-enough-password');
      await accept.getByLabel('Password again').fill('a-long-enough-password');
      await accept.getByRole('button', { name: 'Create account and join' }).click();
      await page.waitForURL(/\/desk$/);
      expect(await navLabels(page)).toEqual(EXPECTED_NAV.reviewer);
    } finally {
      await newcomerBrowser.close();
    }
    await owner.close();
  });
});
