/**
 * Runs an exporter in a worker thread so a hard time budget can stop it: the geometry and writers are
 * synchronous, and only terminating the thread interrupts them. Used by scripts/worker.ts (run by tsx).
 */
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import { ExportRefused, type Exporter, type ExportOutcome } from './export-job';
import type { ThreadMessage } from './export-thread';

export interface ThreadedExporterOptions {
  /** absolute path of a module whose `exportRevision` export is an Exporter */
  modulePath: string;
  /** wall-clock budget of one export, ms */
  budgetMs: number;
  /** heap limit of the export thread, MB */
  heapMb?: number;
}

const THREAD_ENTRY = path.join(__dirname, 'export-thread.ts');

export function threadedExporter({ modulePath, budgetMs, heapMb = 3072 }: ThreadedExporterOptions): Exporter {
  return (input, onProgress) =>
    new Promise<ExportOutcome>((resolve, reject) => {
      // The thread is a fresh JavaScript context; it loads TypeScript the way the parent does (tsx).
      const bootstrap = `require(${JSON.stringify(require.resolve('tsx/cjs/api'))}).register(); require(${JSON.stringify(THREAD_ENTRY)});`;
      const worker = new Worker(bootstrap, {
        eval: true,
        workerData: { modulePath, input },
        resourceLimits: { maxOldGenerationSizeMb: heapMb },
      });
      let settled = false;
      const finish = (fn: () => void) => {
        if (settled) return;
        settled = true;
        clearTimeout(timer);
        fn();
        void worker.terminate();
      };
      const timer = setTimeout(
        () =>
          finish(() =>
            reject(new ExportRefused(`The export ran longer than its ${Math.round(budgetMs / 1000)} s budget and was stopped. Simplify the design (fewer zones, a coarser chord tolerance) and save again.`)),
          ),
        budgetMs,
      );
      worker.on('message', (message: ThreadMessage) => {
        if (message.kind === 'progress') onProgress(message.fraction, message.stage);
        else if (message.kind === 'done') finish(() => resolve(message.outcome));
        else finish(() => reject(message.refused ? new ExportRefused(message.message) : new Error(message.message)));
      });
      worker.on('error', (error) => {
        const outOfMemory = (error as { code?: string }).code === 'ERR_WORKER_OUT_OF_MEMORY';
        finish(() =>
          reject(
            outOfMemory
              ? new ExportRefused(`The export needed more than ${heapMb} MB of memory and was stopped. Simplify the design and save again.`)
              : error,
          ),
        );
      });
      worker.on('exit', (code) => finish(() => reject(new Error(`the export thread exited (code ${code}) without a result`))));
    });
}
