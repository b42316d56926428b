/** Queue names and payloads of the background jobs (pg-boss, in the app's PostgreSQL). */

/** Builds a revision's bundle: compile, export, store everything in the revision row. */
export const EXPORT_QUEUE = 'revision-export';
/** Receives export jobs that pg-boss gave up on (worker crash, time-out), so their revisions get marked failed. */
export const EXPORT_DEAD_QUEUE = 'revision-export-dead';

/** Runs the optical check of a revision whose bundle is stored; the result is cached in its report. */
export const FOCUS_QUEUE = 'revision-focus-check';

/** Payload of both the export and the focus-check jobs. */
export interface ExportJobPayload {
  revisionId: string;
}

/** A job stuck in the active state this long is failed by pg-boss and retried or dead-lettered. */
export const EXPORT_EXPIRE_SECONDS = 660;
/** One more attempt after a crash or time-out; failures inside the export are final (they would fail again). */
export const EXPORT_RETRY_LIMIT = 1;

export function isExportJobPayload(value: unknown): value is ExportJobPayload {
  return typeof value === 'object' && value !== null && typeof (value as ExportJobPayload).revisionId === 'string';
}
