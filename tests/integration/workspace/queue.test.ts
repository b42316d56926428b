/**
 * The export queue end to end in the real PostgreSQL: a saved revision's job goes through pg-boss to
 * the worker's handlers (the same registration scripts/worker.ts uses) and the revision ends ready or failed.
 */
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { closeDb, db } from '@/db';
import { databaseUrl } from '@/db/url';
import { designs, revisions } from '@/db/schema';
import { createRevision, exportStore, focusStore } from '@/db/queries/revisions';
import type { FocusTask } from '@/lib/jobs/focus-job';
import { randomUUID } from 'node:crypto';
import { ensureExportQueues, getBoss, sendExportJob, stopBoss } from '@/lib/jobs/boss';
import type { Exporter } from '@/lib/jobs/export-job';
import { threadedTask } from '@/lib/jobs/threaded-task';
import { DEAD_LETTER_MESSAGE, workExportQueues } from '@/lib/jobs/work-queues';
import { EXPORT_EXPIRE_SECONDS } from '@/lib/jobs/queues';
import { makeTeam, type TestTeam } from '../review/fixtures';

let team: TestTeam;
// Queues of this file only: a worker started by scripts/test.sh works the real ones.
const tag = randomUUID().slice(0, 8);
const queues = { work: `revision-export-test-${tag}`, dead: `revision-export-test-${tag}-dead`, focus: `revision-focus-test-${tag}` };
// Stands in for the optics: the test is about the queue, not the simulation.
const focusTask: FocusTask = async (input) => ({ result: { checkedSourceLength: input.source.length }, chordTolerance_um: 0.05 });

beforeAll(async () => {
  team = await makeTeam();
  const boss = await getBoss(databaseUrl(), { worker: true });
  const exporter: Exporter = threadedTask({ modulePath: path.join(__dirname, 'fixtures', 'exporters.ts'), exportName: 'exportRevision', budgetMs: 5000, what: 'export' });
  await ensureExportQueues(boss, queues);
  await workExportQueues(boss, { store: exportStore, exporter, focusStore, focusTask, queues });
});
// The private queues stay behind, empty; the test database is recreated on every run.
afterAll(async () => {
  await stopBoss();
  await closeDb();
});

async function save(source: string): Promise<string> {
  const [d] = await db.select({ version: designs.version }).from(designs).where(eq(designs.id, team.designId));
  return (await createRevision({ designId: team.designId, authorId: team.members.designer.id, source, message: 'queue test', baseVersion: d.version })).id;
}

async function settled(id: string, timeoutMs = 20_000) {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const [r] = await db.select().from(revisions).where(eq(revisions.id, id));
    if (r.buildStatus === 'ready' || r.buildStatus === 'failed') return r;
    if (Date.now() > until) throw new Error(`revision still ${r.buildStatus} after ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

describe('export queue', () => {
  it('exports a queued revision through pg-boss', async () => {
    const id = await save('# ok\n');
    await sendExportJob(await getBoss(databaseUrl(), { worker: true }), { revisionId: id }, queues.work);
    const r = await settled(id);
    expect(r.buildStatus).toBe('ready');
    expect(r.bundle?.byteLength).toBeGreaterThan(0);
    // Then the focus check runs on its own queue and is cached in the report, the bundle untouched.
    const until = Date.now() + 20_000;
    let report = r.report as Record<string, unknown> | null;
    while (!report?.focusCheck && Date.now() < until) {
      await new Promise((resolve) => setTimeout(resolve, 200));
      [{ report }] = (await db.select({ report: revisions.report }).from(revisions).where(eq(revisions.id, id))) as { report: Record<string, unknown> | null }[];
    }
    expect(report?.focusCheck).toEqual({ result: { checkedSourceLength: 5 }, chordTolerance_um: 0.05 });
    const [after] = await db.select({ sha: revisions.bundleSha256 }).from(revisions).where(eq(revisions.id, id));
    expect(after.sha).toBe(r.bundleSha256);
  });

  it('fails a refused revision through pg-boss, with no bundle', async () => {
    const id = await save('# refuse\n');
    await sendExportJob(await getBoss(databaseUrl(), { worker: true }), { revisionId: id }, queues.work);
    const r = await settled(id);
    expect(r.buildStatus).toBe('failed');
    expect(r.bundle).toBeNull();
  });

  it('a dead-lettered job fails its revision', async () => {
    const id = await save('# ok\n');
    // What pg-boss does when an export job exhausts its retries: a copy lands in the dead-letter queue.
    const boss = await getBoss(databaseUrl(), { worker: true });
    await boss.send(queues.dead, { revisionId: id });
    const r = await settled(id);
    expect(r.buildStatus).toBe('failed');
    expect(r.buildError).toBe(DEAD_LETTER_MESSAGE);
    expect(r.bundle).toBeNull();
  });

  it('writes the current expiry onto queues an older version created, keeping their dead-letter queue', async () => {
    const boss = await getBoss(databaseUrl(), { worker: true });
    const old = { work: `revision-export-old-${tag}`, dead: `revision-export-old-${tag}-dead`, focus: `revision-focus-old-${tag}` };
    await boss.createQueue(old.dead);
    await boss.createQueue(old.work, { name: old.work, deadLetter: old.dead, retryLimit: 1, expireInSeconds: 300 });
    await boss.createQueue(old.focus, { name: old.focus, expireInSeconds: 300 });
    await ensureExportQueues(boss, old);
    for (const name of [old.work, old.focus]) expect((await boss.getQueue(name))?.expireInSeconds).toBe(EXPORT_EXPIRE_SECONDS);
    expect((await boss.getQueue(old.work))?.deadLetter).toBe(old.dead);
  });
});
