/**
 * The background worker: exports saved revisions from the pg-boss queue in the app's PostgreSQL.
 * Started by `npm run up` and by the tests (scripts/lib/services.sh); stops cleanly on SIGTERM/SIGINT.
 */
import path from 'node:path';
import { closeDb } from '@/db';
import { databaseUrl } from '@/db/url';
import { exportStore, focusStore } from '@/db/queries/revisions';
import { getBoss, stopBoss } from '@/lib/jobs/boss';
import { EXPORT_EXPIRE_SECONDS, EXPORT_QUEUE } from '@/lib/jobs/queues';
import type { Exporter } from '@/lib/jobs/export-job';
import type { FocusTask } from '@/lib/jobs/focus-job';
import { threadedTask } from '@/lib/jobs/threaded-task';
import { workExportQueues } from '@/lib/jobs/work-queues';

/**
 * Wall-clock budget of one export; beyond it the export thread is stopped and the revision fails.
 * Ten minutes: a 10 mm two-focus design (42 M vertices, every piece opened for the report) takes about
 * seven on one core (`npm run bench:export`).
 */
const EXPORT_BUDGET_MS = Math.min(Number(process.env.ZW_EXPORT_BUDGET_MS ?? 600_000), (EXPORT_EXPIRE_SECONDS - 10) * 1000);

async function main(): Promise<void> {
  const boss = await getBoss(databaseUrl(), { worker: true });
  const jobs = path.join(__dirname, '..', 'lib', 'jobs');
  const exporter: Exporter = threadedTask({ modulePath: path.join(jobs, 'export-revision.ts'), exportName: 'exportRevision', budgetMs: EXPORT_BUDGET_MS, what: 'export' });
  const focusTask: FocusTask = threadedTask({ modulePath: path.join(jobs, 'focus-revision.ts'), exportName: 'focusCheckRevision', budgetMs: EXPORT_BUDGET_MS, what: 'focus check' });
  await workExportQueues(boss, { store: exportStore, exporter, focusStore, focusTask, log: (line) => console.log(`[worker] ${line}`) });
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
