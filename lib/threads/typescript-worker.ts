/**
 * Starts a worker thread on a TypeScript module. A thread is a fresh JavaScript context, so it first
 * registers tsx's CommonJS hook (the way the worker process and the CLI load TypeScript), then
 * requires the entry. Used by the job threads (lib/jobs/threaded-task.ts) and the mask tile threads
 * (lib/export/mask-threads.ts).
 */
import { Worker, type WorkerOptions } from 'node:worker_threads';

export function startTypeScriptWorker(entryPath: string, options: Omit<WorkerOptions, 'eval'>): Worker {
  const bootstrap = `require(${JSON.stringify(require.resolve('tsx/cjs/api'))}).register(); require(${JSON.stringify(entryPath)});`;
  return new Worker(bootstrap, { ...options, eval: true });
}
