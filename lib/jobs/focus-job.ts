/**
 * The focus-check job, queued when a revision's bundle is stored: its result is cached in the
 * revision's report (`report.focusCheck`), beside the bundle it was computed from.
 */
import type { PhaseMapRecord, ProgressReporter } from './export-job';

export interface FocusInput {
  source: string;
  processProfile: Record<string, unknown>;
  phaseMaps: PhaseMapRecord[];
}

export type FocusOutcome = { result: unknown; chordTolerance_um: number } | { error: string };

export type FocusTask = (input: FocusInput, onProgress: ProgressReporter) => Promise<FocusOutcome>;

export interface FocusStore {
  /** the input of a ready revision that has no focus check yet; null otherwise */
  load(revisionId: string): Promise<FocusInput | null>;
  save(revisionId: string, outcome: FocusOutcome): Promise<void>;
}

export async function runFocusJob(revisionId: string, store: FocusStore, task: FocusTask): Promise<'stored' | 'skipped'> {
  const input = await store.load(revisionId);
  if (!input) return 'skipped';
  let outcome: FocusOutcome;
  try {
    outcome = await task(input, () => undefined);
  } catch (error) {
    outcome = { error: error instanceof Error ? error.message : String(error) };
  }
  await store.save(revisionId, outcome);
  return 'stored';
}
