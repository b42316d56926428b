/** Body of the export thread started by threaded-exporter.ts: runs one export and posts its progress and outcome. */
import { parentPort, workerData } from 'node:worker_threads';
import { ExportRefused, type ExportInput, type Exporter, type ExportOutcome } from './export-job';

export type ThreadMessage =
  | { kind: 'progress'; fraction: number; stage: string }
  | { kind: 'done'; outcome: ExportOutcome }
  | { kind: 'error'; message: string; refused: boolean };

async function main(): Promise<void> {
  const { modulePath, input } = workerData as { modulePath: string; input: ExportInput };
  const port = parentPort!;
  const post = (message: ThreadMessage) => port.postMessage(message);
  try {
    // Loaded with require: the thread registers tsx's CommonJS hook only.
    const { exportRevision } = require(modulePath) as { exportRevision: Exporter };
    const outcome = await exportRevision(input, (fraction, stage) => post({ kind: 'progress', fraction, stage }));
    post({ kind: 'done', outcome });
  } catch (error) {
    post({ kind: 'error', message: error instanceof Error ? error.message : String(error), refused: error instanceof ExportRefused });
  }
}

if (parentPort) void main();
