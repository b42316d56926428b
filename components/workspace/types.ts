/** What the workspace pages hand to their client components (plain JSON, dates as ISO text). */
import type { BuildStatus } from '@/db/schema';
import type { ProcessProfile } from '@/lib/schemas/designs';

export interface RevisionRow {
  id: string;
  number: number;
  authorName: string | null;
  message: string;
  state: string;
  buildStatus: BuildStatus;
  buildProgress: number;
  buildStage: string;
  buildError: string | null;
  zoneCount: number | null;
  /** µm */
  narrowestFeature: number | null;
  bundleBytes: number | null;
  bundleSha256: string | null;
  createdAt: string;
}

export interface WorkspaceDesign {
  id: string;
  name: string;
  description: string;
  teamName: string;
  version: number;
  workingScript: string;
  processProfile: ProcessProfile;
}

export interface PhaseMapRow {
  id: string;
  name: string;
  format: 'png16' | 'csv';
  pitch: number;
  phaseScale: number;
  columns: number;
  rows: number;
  bytes: number;
}

/** Plain-JSON form of a revision summary; copies the listed fields only, so database rows can be passed as they are. */
export function toRevisionRow(r: Omit<RevisionRow, 'createdAt'> & { createdAt: Date | string }): RevisionRow {
  return {
    id: r.id,
    number: r.number,
    authorName: r.authorName,
    message: r.message,
    state: r.state,
    buildStatus: r.buildStatus,
    buildProgress: r.buildProgress,
    buildStage: r.buildStage,
    buildError: r.buildError,
    zoneCount: r.zoneCount,
    narrowestFeature: r.narrowestFeature,
    bundleBytes: r.bundleBytes,
    bundleSha256: r.bundleSha256,
    createdAt: typeof r.createdAt === 'string' ? r.createdAt : r.createdAt.toISOString(),
  };
}
