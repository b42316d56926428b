/** Bounds on uploaded phase maps, so a file cannot make the server or the browser allocate without limit. */
export const PHASE_MAP_LIMITS = {
  /** bytes of the uploaded file */
  maxFileBytes: 32 * 1024 * 1024,
  maxColumns: 4096,
  maxRows: 4096,
  maxSamples: 4096 * 4096,
  /** µm; larger pitches are surely a unit mistake */
  maxPitch: 1000,
} as const;
