/** Registers the worker's handlers on a started pg-boss; shared by scripts/worker.ts and the queue tests. */
import type PgBoss from 'pg-boss';
import { DEFAULT_EXPORT_QUEUES, type ExportQueueNames } from './boss';
import { runExportJob, type Exporter, type ExportStore } from './export-job';
import { runFocusJob, type FocusStore, type FocusTask } from './focus-job';
import { isExportJobPayload } from './queues';

export const DEAD_LETTER_MESSAGE =
  'The export did not finish: the worker stopped or the job ran out of time. Nothing was stored; retry the revision.';

export interface WorkerDeps {
  store: ExportStore;
  exporter: Exporter;
  focusStore: FocusStore;
  focusTask: FocusTask;
  log?: (line: string) => void;
  queues?: ExportQueueNames;
}

export async function workExportQueues(boss: PgBoss, deps: WorkerDeps): Promise<void> {
  const log = deps.log ?? (() => undefined);
  const queues = deps.queues ?? DEFAULT_EXPORT_QUEUES;
  await boss.work(queues.work, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ([job]) => {
    if (!isExportJobPayload(job.data)) return;
    const result = await runExportJob(job.data.revisionId, deps.store, deps.exporter);
    log(`revision ${job.data.revisionId}: ${result.status}${result.message ? ` (${result.message})` : ''}`);
    // The bundle is usable now; the optical check follows on its own queue, so the next export need not wait for it.
    if (result.status === 'ready') await boss.send(queues.focus, { revisionId: job.data.revisionId });
  });
  // pg-boss gave up on the job (worker crash, time-out, database trouble): the revision must not stay "running".
  await boss.work(queues.dead, { batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
    if (!isExportJobPayload(job.data)) return;
    await deps.store.fail(job.data.revisionId, DEAD_LETTER_MESSAGE);
    log(`revision ${job.data.revisionId}: failed after the job was dead-lettered`);
  });
  await boss.work(queues.focus, { batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
    if (!isExportJobPayload(job.data)) return;
    log(`revision ${job.data.revisionId}: focus check ${await runFocusJob(job.data.revisionId, deps.focusStore, deps.focusTask)}`);
  });
}
