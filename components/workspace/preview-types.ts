import type { PackedLibrary } from '@/components/mask-view/packing';

/** Manufacturability numbers of a mask, from the geometry report. Lengths in µm. */
export interface MaskFigures {
  zoneCount: number | null;
  polygonCount: number;
  vertexCount: number;
  /** the narrowest line or space found, where it is */
  narrowest: { width: number; x: number; y: number } | null;
  minimumFeature: number;
  /** features narrower than the process minimum */
  belowMinimum: number;
  warnings: string[];
}

/** What the preview route answers: the mask at a coarse chord tolerance, with its figures. */
export interface PreviewResponse {
  library: PackedLibrary | null;
  report: MaskFigures;
  /** the chord tolerance the preview was drawn with (coarser than the bundle's), µm */
  chordTolerance: number;
  elapsedMs: number;
  /** the preview's own message when it could not draw (script problems, over budget) */
  message: string | null;
}
