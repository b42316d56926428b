/**
 * The export job against the real PostgreSQL, with the real worker thread and its budget: a refused,
 * crashed or runaway export leaves the revision failed with its message and no bundle; a retry then
 * stores everything at once, and the stored checksum is the SHA-256 of the stored zip.
 */
import { createHash } from 'node:crypto';
import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { closeDb, db } from '@/db';
import { designs, revisions } from '@/db/schema';
import { createRevision, exportStore, getBundle, requeueFailed } from '@/db/queries/revisions';
import { runExportJob, type Exporter } from '@/lib/jobs/export-job';
import { threadedTask } from '@/lib/jobs/threaded-task';
import { makeTeam, type TestTeam } from '../review/fixtures';

const exporter: Exporter = threadedTask({ modulePath: path.join(__dirname, 'fixtures', 'exporters.ts'), exportName: 'exportRevision', budgetMs: 3000, what: 'export' });

let team: TestTeam;
beforeAll(async () => {
  team = await makeTeam();
});
afterAll(closeDb);

async function save(source: string): Promise<string> {
  const [design] = await db.select({ version: designs.version }).from(designs).where(eq(designs.id, team.designId));
  const created = await createRevision({ designId: team.designId, authorId: team.members.designer.id, source, message: 'job test', baseVersion: design.version });
  return created.id;
}

async function row(id: string) {
  const [r] = await db.select().from(revisions).where(eq(revisions.id, id));
  return r;
}

function expectFailedWithoutBundle(r: Awaited<ReturnType<typeof row>>) {
  expect(r.buildStatus).toBe('failed');
  expect(r.bundle).toBeNull();
  expect(r.bundleSha256).toBeNull();
  expect(r.manifest).toBeNull();
  expect(r.report).toBeNull();
}

describe('export job failure path', () => {
  it('a refused export fails the revision with the exporter’s own message and stores nothing', async () => {
    const id = await save('# refuse\n');
    const result = await runExportJob(id, exportStore, exporter);
    expect(result.status).toBe('failed');
    const r = await row(id);
    expectFailedWithoutBundle(r);
    expect(r.buildError).toBe('The mask has 9000000 vertices; the budget is 5000000.');
    expect(await getBundle(id)).toBeNull();
  });

  it('an internal error fails the revision with a message that asks for a retry', async () => {
    const id = await save('# crash\n');
    await runExportJob(id, exportStore, exporter);
    const r = await row(id);
    expectFailedWithoutBundle(r);
    expect(r.buildError).toMatch(/internal error.*Retry/);
  });

  it('a runaway export is stopped at its time budget and fails the revision', async () => {
    const id = await save('# spin\n');
    const started = Date.now();
    await runExportJob(id, exportStore, exporter);
    expect(Date.now() - started).toBeLessThan(10_000);
    const r = await row(id);
    expectFailedWithoutBundle(r);
    expect(r.buildError).toMatch(/budget/);
  });

  it('retrying a failed revision keeps its number and script and stores the whole bundle', async () => {
    const marker = path.join(mkdtempSync(path.join(os.tmpdir(), 'zw-flaky-')), 'seen');
    const id = await save(`# flaky ${marker}\nsecond line\n`);
    await runExportJob(id, exportStore, exporter);
    const failed = await row(id);
    expectFailedWithoutBundle(failed);
    expect(await requeueFailed(id, team.members.designer.id)).toBe(true);
    expect(await requeueFailed(id, team.members.designer.id)).toBe(false);
    const result = await runExportJob(id, exportStore, exporter);
    expect(result.status).toBe('ready');

    const r = await row(id);
    expect(r.number).toBe(failed.number);
    expect(r.source).toBe(failed.source);
    expect(r.buildStatus).toBe('ready');
    expect(r.buildError).toBeNull();
    expect(r.buildAttempts).toBe(2);
    expect(r.bundle).not.toBeNull();
    expect(r.bundleBytes).toBe(r.bundle!.byteLength);
    // The checksum the page shows is the SHA-256 of the bytes the download serves.
    expect(r.bundleSha256).toBe(createHash('sha256').update(r.bundle!).digest('hex'));
    const bundle = await getBundle(id);
    expect(bundle!.sha256).toBe(createHash('sha256').update(bundle!.zip).digest('hex'));
    expect(bundle!.fileName).toMatch(new RegExp(`-r${r.number}\\.zip$`));
  });

  it('a job for a finished revision changes nothing', async () => {
    const id = await save('# ok\n');
    await runExportJob(id, exportStore, exporter);
    const before = await row(id);
    expect((await runExportJob(id, exportStore, exporter)).status).toBe('skipped');
    const after = await row(id);
    expect(after.bundleSha256).toBe(before.bundleSha256);
    expect(after.buildAttempts).toBe(before.buildAttempts);
  });
});
