/**
 * The background worker: exports saved revisions from the pg-boss queue in the app's PostgreSQL.
 * Started by `npm run up` and by the tests (scripts/lib/services.sh); stops cleanly on SIGTERM/SIGINT.
 */
import path from 'node:path';
import { closeDb } from '@/db';
import { databaseUrl } from '@/db/url';
import { exportStore, markBuildFailed } from '@/db/queries/revisions';
import { getBoss, stopBoss } from '@/lib/jobs/boss';
import { runExportJob } from '@/lib/jobs/export-job';
import { EXPORT_DEAD_QUEUE, EXPORT_EXPIRE_SECONDS, EXPORT_QUEUE, isExportJobPayload } from '@/lib/jobs/queues';
import { threadedExporter } from '@/lib/jobs/threaded-exporter';

/** Wall-clock budget of one export; beyond it the export thread is stopped and the revision fails. */
const EXPORT_BUDGET_MS = Number(process.env.ZW_EXPORT_BUDGET_MS ?? 120_000);

async function main(): Promise<void> {
  const boss = await getBoss(databaseUrl(), { worker: true });
  const exporter = threadedExporter({
    modulePath: path.join(__dirname, '..', 'lib', 'jobs', 'export-revision.ts'),
    budgetMs: Math.min(EXPORT_BUDGET_MS, (EXPORT_EXPIRE_SECONDS - 10) * 1000),
  });

  await boss.work(EXPORT_QUEUE, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ([job]) => {
    if (!isExportJobPayload(job.data)) return;
    const result = await runExportJob(job.data.revisionId, exportStore, exporter);
    console.log(`[worker] revision ${job.data.revisionId}: ${result.status}${result.message ? ` (${result.message})` : ''}`);
  });

  // pg-boss gave up on the job (worker crash, time-out, database trouble): the revision must not stay "running".
  await boss.work(EXPORT_DEAD_QUEUE, { batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
    if (!isExportJobPayload(job.data)) return;
    await markBuildFailed(
      job.data.revisionId,
      'The export did not finish: the worker stopped or the job ran out of time. Nothing was stored; retry the revision.',
    );
    console.log(`[worker] revision ${job.data.revisionId}: failed after the job was dead-lettered`);
  });

  console.log(`[worker] working queue ${EXPORT_QUEUE} (budget ${EXPORT_BUDGET_MS} ms per export)`);

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`[worker] ${signal}: stopping`);
    await stopBoss();
    await closeDb();
    process.exit(0);
  };
  process.on('SIGTERM', () => void stop('SIGTERM'));
  process.on('SIGINT', () => void stop('SIGINT'));
}

main().catch((error) => {
  console.error('[worker] could not start:', error instanceof Error ? error.message : error);
  process.exit(1);
});
