/**
 * The pg-boss connection: one per process, in the app's own PostgreSQL (schema "pgboss").
 * The app only sends; scripts/worker.ts also works the queues and runs maintenance.
 */
import PgBoss from 'pg-boss';
import { EXPORT_DEAD_QUEUE, EXPORT_EXPIRE_SECONDS, EXPORT_QUEUE, EXPORT_RETRY_LIMIT, FOCUS_QUEUE, type ExportJobPayload } from './queues';

type Holder = { boss?: Promise<PgBoss> };
// Kept on globalThis so the dev server's module reloads reuse one connection.
const holder = globalThis as unknown as { __zonewrightBoss?: Holder };

/** A pair of export queues; the tests use their own names so a running worker cannot take their jobs. */
export interface ExportQueueNames {
  work: string;
  dead: string;
  focus: string;
}

export const DEFAULT_EXPORT_QUEUES: ExportQueueNames = { work: EXPORT_QUEUE, dead: EXPORT_DEAD_QUEUE, focus: FOCUS_QUEUE };

export async function ensureExportQueues(boss: PgBoss, names: ExportQueueNames = DEFAULT_EXPORT_QUEUES): Promise<void> {
  // createQueue is idempotent; the dead-letter queue must exist before the queue that names it.
  // createQueue leaves an existing queue's settings alone, so they are written again for databases
  // made by an older version.
  const work = { name: names.work, deadLetter: names.dead, retryLimit: EXPORT_RETRY_LIMIT, retryDelay: 2, expireInSeconds: EXPORT_EXPIRE_SECONDS };
  // A lost focus check is only a missing cache entry: no retries, no dead letters.
  const focus = { name: names.focus, retryLimit: 0, expireInSeconds: EXPORT_EXPIRE_SECONDS };
  await boss.createQueue(names.dead);
  await boss.createQueue(names.work, work);
  await boss.updateQueue(names.work, work);
  await boss.createQueue(names.focus, focus);
  await boss.updateQueue(names.focus, focus);
}

/** Starts pg-boss once per process. `worker: true` also runs its maintenance (expiry, dead letters). */
export function getBoss(connectionString: string, options: { worker: boolean }): Promise<PgBoss> {
  const h = (holder.__zonewrightBoss ??= {});
  if (!h.boss) {
    const boss = new PgBoss({
      connectionString,
      max: 4,
      supervise: options.worker,
      schedule: false,
      maintenanceIntervalSeconds: 5,
    });
    boss.on('error', (error) => console.error('[jobs]', error.message));
    h.boss = boss
      .start()
      .then(async () => {
        await ensureExportQueues(boss);
        return boss;
      })
      .catch((error) => {
        h.boss = undefined;
        throw error;
      });
  }
  return h.boss;
}

export async function stopBoss(): Promise<void> {
  const h = holder.__zonewrightBoss;
  if (!h?.boss) return;
  const boss = await h.boss.catch(() => null);
  h.boss = undefined;
  await boss?.stop({ graceful: true, wait: true, timeout: 10_000 });
}

/** Queues the export of one revision; returns the job id. */
export async function sendExportJob(boss: PgBoss, payload: ExportJobPayload, queue = EXPORT_QUEUE): Promise<string> {
  const id = await boss.send(queue, payload);
  if (!id) throw new Error('the job queue did not accept the export job');
  return id;
}
