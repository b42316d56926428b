/** Body of the thread started by threaded-task.ts: runs one task and posts its progress and output. */
import { parentPort, workerData } from 'node:worker_threads';
import { ExportRefused, type ProgressReporter } from './export-job';

export type ThreadMessage =
  | { kind: 'progress'; fraction: number; stage: string }
  | { kind: 'done'; output: unknown }
  | { kind: 'error'; message: string; refused: boolean };

type Task = (input: unknown, onProgress: ProgressReporter) => Promise<unknown>;

async function main(): Promise<void> {
  const { modulePath, exportName, input } = workerData as { modulePath: string; exportName: string; input: unknown };
  const port = parentPort!;
  const post = (message: ThreadMessage) => port.postMessage(message);
  try {
    // Loaded with require: the thread registers tsx's CommonJS hook only.
    const task = (require(modulePath) as Record<string, Task>)[exportName];
    if (typeof task !== 'function') throw new Error(`${modulePath} has no function ${exportName}`);
    const output = await task(input, (fraction, stage) => post({ kind: 'progress', fraction, stage }));
    post({ kind: 'done', output });
  } catch (error) {
    post({ kind: 'error', message: error instanceof Error ? error.message : String(error), refused: error instanceof ExportRefused });
  }
}

if (parentPort) void main();
