/**
 * The export job, written against two ports so it can run in the worker and in tests alike:
 * `store` reads and writes the revision row, `exporter` turns a script into a bundle.
 * A revision ends either with everything written at once (ready) or with an error and no bundle (failed).
 */

/** What the exporter needs from the revision. */
export interface ExportInput {
  source: string;
  designId: string;
  designName: string;
  revisionId: string;
  revisionNumber: number;
  /** ISO time the revision was saved; dates the bundle's files so a re-export is byte-identical */
  savedAt: string;
  processProfile: Record<string, unknown>;
  /** name → raw uploaded file with its parameters; the exporter parses what the script uses */
  phaseMaps: PhaseMapRecord[];
}

export interface PhaseMapRecord {
  name: string;
  format: 'png16' | 'csv';
  pitch: number;
  phaseScale: number;
  data: Uint8Array;
}

/** Everything the revision row holds once the export succeeds. */
export interface ExportOutcome {
  zip: Uint8Array;
  sha256: string;
  manifest: Record<string, unknown>;
  report: Record<string, unknown>;
  parameters: Record<string, unknown>;
  zoneCount: number | null;
  /** µm */
  narrowestFeature: number | null;
}

export type ProgressReporter = (fraction: number, stage: string) => void;

export type Exporter = (input: ExportInput, onProgress: ProgressReporter) => Promise<ExportOutcome>;

export interface ExportStore {
  /** Marks the revision running (attempt + 1) and returns its input; null when it is not waiting for a build. */
  claim(revisionId: string): Promise<ExportInput | null>;
  progress(revisionId: string, fraction: number, stage: string): Promise<void>;
  /** Writes the outcome and marks the revision ready, in one statement; false when the revision was not running. */
  complete(revisionId: string, outcome: ExportOutcome): Promise<boolean>;
  fail(revisionId: string, message: string): Promise<void>;
}

/** An error whose message is meant for the designer (a script problem, a budget exceeded). */
export class ExportRefused extends Error {}

/** Progress writes are throttled: one per this many milliseconds, plus stage changes. */
const PROGRESS_INTERVAL_MS = 250;

export type ExportJobResult = { status: 'ready' | 'failed' | 'skipped'; message?: string };

export async function runExportJob(revisionId: string, store: ExportStore, exporter: Exporter): Promise<ExportJobResult> {
  const input = await store.claim(revisionId);
  if (!input) return { status: 'skipped' };

  let lastWrite = 0;
  let lastStage = '';
  let pending: Promise<void> = Promise.resolve();
  const onProgress: ProgressReporter = (fraction, stage) => {
    const now = Date.now();
    if (stage === lastStage && now - lastWrite < PROGRESS_INTERVAL_MS) return;
    lastWrite = now;
    lastStage = stage;
    const clamped = Math.min(1, Math.max(0, fraction));
    // Progress is advisory: a failed write must not fail the export.
    pending = pending.then(() => store.progress(revisionId, clamped, stage)).catch(() => undefined);
  };

  try {
    const outcome = await exporter(input, onProgress);
    await pending;
    const written = await store.complete(revisionId, outcome);
    return written ? { status: 'ready' } : { status: 'skipped' };
  } catch (error) {
    await pending;
    const message =
      error instanceof ExportRefused
        ? error.message
        : `The export stopped with an internal error (${error instanceof Error ? error.message : String(error)}). Retry the revision; if it fails again, tell the team.`;
    await store.fail(revisionId, message);
    return { status: 'failed', message };
  }
}
