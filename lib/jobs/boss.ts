/**
 * The pg-boss connection: one per process, in the app's own PostgreSQL (schema "pgboss").
 * The app only sends; scripts/worker.ts also works the queues and runs maintenance.
 */
import PgBoss from 'pg-boss';
import { EXPORT_DEAD_QUEUE, EXPORT_EXPIRE_SECONDS, EXPORT_QUEUE, EXPORT_RETRY_LIMIT, type ExportJobPayload } from './queues';

type Holder = { boss?: Promise<PgBoss> };
// Kept on globalThis so the dev server's module reloads reuse one connection.
const holder = globalThis as unknown as { __zonewrightBoss?: Holder };

async function ensureQueues(boss: PgBoss): Promise<void> {
  // createQueue is idempotent; the dead-letter queue must exist before the queue that names it.
  await boss.createQueue(EXPORT_DEAD_QUEUE);
  await boss.createQueue(EXPORT_QUEUE, {
    name: EXPORT_QUEUE,
    deadLetter: EXPORT_DEAD_QUEUE,
    retryLimit: EXPORT_RETRY_LIMIT,
    retryDelay: 2,
    expireInSeconds: EXPORT_EXPIRE_SECONDS,
  });
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
        await ensureQueues(boss);
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
export async function sendExportJob(boss: PgBoss, payload: ExportJobPayload): Promise<string> {
  const id = await boss.send(EXPORT_QUEUE, payload);
  if (!id) throw new Error('the job queue did not accept the export job');
  return id;
}
