/**
 * The review half of the team story in Chromium against the running app, database and mail fake:
 * a designer saves revisions 1 and 2 of the two-focus example through the real save path (API)
 * and requests review on the page; the reviewer compares 1 and 2 (script diff and XOR area),
 * comments on a line mentioning fab staff, approves and releases; fab staff download the bundle,
 * check every manifest checksum, and record a run with a photo; the mailbox holds the messages.
 */
import { createHash, randomUUID } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import JSZip from 'jszip';
import { PNG } from 'pngjs';
import { eq, sql } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { afterAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '@/db';
import { capturedMail, fabPhotos, fabRuns } from '@/db/schema';
import { launchBrowser, signIn, type Browser } from './browser';

const tag = randomUUID().slice(0, 6);
const designName = `Review story ${tag}`;
const opened: Browser[] = [];
const ids: { design?: string; r1?: string; r2?: string } = {};
let fabPage: Page | undefined;

afterAll(async () => {
  for (const b of opened) await b.close();
  await closeDb();
});

async function personPage(email: string): Promise<Page> {
  const browser = await launchBrowser();
  opened.push(browser);
  // this story waits on exports and the editor bundle; give a busy machine more than the usual 20 s
  browser.context.setDefaultTimeout(60_000);
  const page = await browser.newPage();
  await signIn(page, email);
  return page;
}

async function api<T>(page: Page, method: 'GET' | 'POST', url: string, data?: unknown): Promise<T> {
  const response = method === 'GET' ? await page.request.get(url) : await page.request.post(url, { data });
  const body = await response.text();
  if (!response.ok()) throw new Error(`${method} ${url} answered ${response.status()}: ${body}`);
  return JSON.parse(body) as T;
}

async function waitForBundle(page: Page, revisionId: string): Promise<void> {
  const deadline = Date.now() + 180_000;
  for (;;) {
    const { revision } = await api<{ revision: { buildStatus: string; buildError: string | null } }>(page, 'GET', `/api/revisions/${revisionId}`);
    if (revision.buildStatus === 'ready') return;
    if (revision.buildStatus === 'failed') throw new Error(`the export failed: ${revision.buildError}`);
    if (Date.now() > deadline) throw new Error(`the export of ${revisionId} did not finish in 3 minutes (${revision.buildStatus})`);
    await new Promise((r) => setTimeout(r, 1000));
  }
}

/** Waits for a page or the server to catch up (vitest's own poll gives up after one second). */
function eventually<T>(read: () => T | Promise<T>) {
  return expect.poll(read, { timeout: 60_000, interval: 250 });
}

async function confirmMove(page: Page, label: string): Promise<void> {
  const moves = page.getByTestId('revision-moves');
  await moves.getByRole('button', { name: label, exact: true }).click();
  await moves.getByRole('button', { name: `Confirm: ${label}` }).click();
}

async function mailFor(address: string): Promise<string[]> {
  const rows = await db
    .select({ subject: capturedMail.subject })
    .from(capturedMail)
    .where(sql`${address} = ANY(${capturedMail.envelopeTo})`);
  return rows.map((r) => r.subject);
}

describe('review, release and fabrication in the browser', () => {
  it('the designer saves revisions 1 and 2 and requests review', async () => {
    const page = await personPage('designer@example.com');
    const { teamId } = await api<{ teamId: string }>(page, 'GET', '/api/designs');
    const { design } = await api<{ design: { id: string; version: number; workingScript: string } }>(page, 'POST', '/api/designs', {
      teamId,
      name: designName,
      description: 'Invented demo scenario for the review story test.',
      example: 'two-focus-offaxis',
    });
    ids.design = design.id;
    const script1 = design.workingScript;
    expect(script1).toContain('focal: 800 um');
    const r1 = await api<{ id: string; designVersion: number }>(page, 'POST', `/api/designs/${design.id}/revisions`, {
      script: script1,
      message: 'first cut',
      baseVersion: design.version,
    });
    ids.r1 = r1.id;
    await waitForBundle(page, r1.id);
    const script2 = script1.replace('focal: 800 um', 'focal: 900 um');
    const r2 = await api<{ id: string }>(page, 'POST', `/api/designs/${design.id}/revisions`, {
      script: script2,
      message: 'near focus 800 µm → 900 µm',
      baseVersion: r1.designVersion,
    });
    ids.r2 = r2.id;
    await waitForBundle(page, r2.id);

    await page.goto(`/revisions/${r2.id}`);
    await confirmMove(page, 'Request review');
    await eventually(() => page.getByTestId('revision-page').locator('h1').innerText()).toContain('in review');
  }, 420_000);

  it('the reviewer compares 1 and 2, comments on a line, approves and releases to fab', async () => {
    const page = await personPage('reviewer@example.com');
    await page.goto(`/revisions/${ids.r2}`);
    await page.getByTestId('compare-previous').click();
    await page.waitForURL((url) => url.pathname === '/compare' && url.searchParams.get('a') === ids.r1 && url.searchParams.get('b') === ids.r2);
    const diff = page.getByTestId('script-diff');
    await eventually(() => diff.innerText()).toMatch(/\+1\s+−1 lines/);
    await diff.locator('.monaco-diff-editor').first().waitFor({ timeout: 120_000 });
    const added = page.getByTestId('xor-table').getByTestId('added-area').first();
    await added.waitFor({ timeout: 60_000 });
    const addedArea = Number((await added.innerText()).replace(/[^0-9.]/g, ''));
    const removedArea = Number((await page.getByTestId('xor-table').getByTestId('removed-area').first().innerText()).replace(/[^0-9.]/g, ''));
    // moving a focus changes zones across the whole aperture, so both areas are far from zero
    expect(addedArea).toBeGreaterThan(1);
    expect(removedArea).toBeGreaterThan(1);
    await page.getByTestId('xor-overlay').waitFor();
    // the parameter table names the moved focus in words, the raw path in its tooltip
    const movedFocus = page.getByTestId('change-label').filter({ hasText: /^Focus 1 · z \(µm\)$/ });
    await movedFocus.first().waitFor();
    expect(await movedFocus.first().getAttribute('title')).toMatch(/foci\[0\]\.z$/);

    await page.goto(`/revisions/${ids.r2}`);
    await page.getByTestId('script-lines').getByRole('button', { name: '11', exact: true }).click();
    const composer = page.getByRole('form', { name: 'New comment' });
    await eventually(() => composer.getByLabel('Line number').inputValue()).toBe('11');
    await composer.getByRole('textbox', { name: 'Comment' }).fill('Near focus now 900 µm; @fab please check the outer zones after exposure.');
    await composer.getByRole('button', { name: 'Post comment' }).click();
    const comment = page.getByTestId('comment').filter({ hasText: 'please check the outer zones' });
    await comment.getByRole('button', { name: 'line 11' }).waitFor();
    await eventually(() => comment.getAttribute('id')).toMatch(/^comment-[0-9a-f-]{36}$/);

    await confirmMove(page, 'Approve');
    await eventually(() => page.getByTestId('revision-page').locator('h1').innerText()).toContain('approved');
    await confirmMove(page, 'Release to fab');
    await eventually(() => page.getByTestId('revision-page').locator('h1').innerText()).toContain('released to fab');
  }, 240_000);

  it('fab staff download the bundle, check every checksum and record a run with a photo', async () => {
    const page = await personPage('fab@example.com');
    fabPage = page;
    await page.goto('/fab');
    const item = page.locator('[data-testid^="fab-item-"]').filter({ has: page.locator(`a[href="/revisions/${ids.r2}"]`) });
    const shown = (await item.getByTestId('fab-sha256').innerText()).trim();
    const [download] = await Promise.all([page.waitForEvent('download'), item.getByRole('link', { name: /Download/ }).click()]);
    const zipBytes = await readFile((await download.path())!);
    expect(createHash('sha256').update(zipBytes).digest('hex')).toBe(shown);
    const zip = await JSZip.loadAsync(zipBytes);
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string')) as { files: { name: string; bytes: number; sha256: string }[] };
    expect(manifest.files.length).toBeGreaterThan(2);
    for (const file of manifest.files) {
      const content = await zip.file(file.name)!.async('uint8array');
      expect(content.length, file.name).toBe(file.bytes);
      expect(createHash('sha256').update(content).digest('hex'), file.name).toBe(file.sha256);
    }

    const png = new PNG({ width: 64, height: 48 });
    png.data.fill(180);
    await item.getByRole('button', { name: 'Record a run' }).click();
    const form = item.getByRole('form', { name: 'Record a run' });
    await form.getByLabel('Tool').fill('mask aligner 2');
    await form.getByLabel('Dose', { exact: true }).fill('120');
    await form.getByLabel('Resist', { exact: true }).fill('positive resist, demo');
    await form.getByLabel('Resist thickness (µm)').fill('0.8');
    await form.getByLabel('Inspection photos').setInputFiles({ name: 'first-exposure.png', mimeType: 'image/png', buffer: PNG.sync.write(png) });
    await form.getByRole('button', { name: 'Record run' }).click();
    // a fabricated revision leaves the queue; the run and its photo are stored with it
    await eventually(async () => (await api<{ revision: { state: string } }>(page, 'GET', `/api/revisions/${ids.r2}`)).revision.state).toBe('fabricated');
    const [stored] = await db
      .select({ runs: sql<number>`count(distinct ${fabRuns.id})::int`, photos: sql<number>`count(${fabPhotos.id})::int` })
      .from(fabRuns)
      .leftJoin(fabPhotos, eq(fabPhotos.fabRunId, fabRuns.id))
      .where(eq(fabRuns.revisionId, ids.r2!));
    expect(stored).toEqual({ runs: 1, photos: 1 });
  }, 180_000);

  it('the mailbox holds the review request, the approval, the release and the mention', async () => {
    const title = `revision 2 of ${designName}`;
    await eventually(() => mailFor('reviewer@example.com')).toContain(`Review requested: ${title}`);
    expect(await mailFor('designer@example.com')).toContain(`Approved: ${title}`);
    const fab = await mailFor('fab@example.com');
    expect(fab).toContain(`Released to fab: ${title}`);
    expect(fab.some((s) => s.endsWith(`mentioned you on ${title}`))).toBe(true);
    // and the Mailbox page of this local run lists them
    await fabPage!.goto('/mailbox');
    await fabPage!.getByRole('link', { name: `Released to fab: ${title}` }).first().waitFor();
    await fabPage!.getByRole('link', { name: `Review requested: ${title}` }).first().waitFor();
  }, 60_000);
});
