/**
 * Runs a job's heavy step in a worker thread so a hard time budget can stop it: the geometry, writers
 * and optics are synchronous, and only terminating the thread interrupts them. Used by scripts/worker.ts
 * (run by tsx) and the job tests.
 */
import path from 'node:path';
import { startTypeScriptWorker } from '../threads/typescript-worker';
import { ExportRefused, type ProgressReporter } from './export-job';
import type { ThreadMessage } from './task-thread';

export interface ThreadedTaskOptions {
  /** absolute path of the module that holds the task */
  modulePath: string;
  /** name of the exported async function (input, onProgress) => output */
  exportName: string;
  /** wall-clock budget of one run, ms */
  budgetMs: number;
  /** heap limit of the thread, MB */
  heapMb?: number;
  /** what the budget message calls the work, e.g. "export" */
  what: string;
}

export type ThreadedTask<I, O> = (input: I, onProgress: ProgressReporter) => Promise<O>;

const THREAD_ENTRY = path.join(__dirname, 'task-thread.ts');

export function threadedTask<I, O>({ modulePath, exportName, budgetMs, heapMb = 3072, what }: ThreadedTaskOptions): ThreadedTask<I, O> {
  return (input, onProgress) =>
    new Promise<O>((resolve, reject) => {
      const worker = startTypeScriptWorker(THREAD_ENTRY, {
        workerData: { modulePath, exportName, input },
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
            reject(new ExportRefused(`The ${what} ran longer than its ${Math.round(budgetMs / 1000)} s budget and was stopped. Simplify the design (fewer zones, a coarser chord tolerance) and save again.`)),
          ),
        budgetMs,
      );
      worker.on('message', (message: ThreadMessage) => {
        if (message.kind === 'progress') onProgress(message.fraction, message.stage);
        else if (message.kind === 'done') finish(() => resolve(message.output as O));
        else finish(() => reject(message.refused ? new ExportRefused(message.message) : new Error(message.message)));
      });
      worker.on('error', (error) => {
        const outOfMemory = (error as { code?: string }).code === 'ERR_WORKER_OUT_OF_MEMORY';
        finish(() =>
          reject(outOfMemory ? new ExportRefused(`The ${what} needed more than ${heapMb} MB of memory and was stopped. Simplify the design and save again.`) : error),
        );
      });
      worker.on('exit', (code) => finish(() => reject(new Error(`the ${what} thread exited (code ${code}) without a result`))));
    });
}
