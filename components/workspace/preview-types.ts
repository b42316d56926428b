import type { LayoutLibrary } from '@/lib/layout/types';
import type { MaskFigures } from '@/lib/jobs/mask-figures';
import type { PhaseMapRecord } from '@/lib/jobs/export-job';

export type { MaskFigures };

/** What the page asks the preview worker to draw. */
export interface PreviewRequest {
  id: number;
  script: string;
  /** µm */
  databaseUnit: number;
  minimumFeature: number;
  chordTolerance: number;
  phaseMaps: PhaseMapRecord[];
}

/** The mask at the preview's chord tolerance with its figures, or the reason there is none. */
export type PreviewResult =
  | { id: number; ok: true; library: LayoutLibrary; figures: MaskFigures; chordTolerance: number; elapsedMs: number }
  | { id: number; ok: false; message: string };
