/** The manufacturability report: shown in the app and written into the bundle's manifest. JSON-safe. */

export interface MeasuredWidth {
  /** width across the zone, µm (along the boundary normal) */
  width_um: number;
  /** where it was measured (midpoint), µm */
  x_um: number;
  y_um: number;
}

export interface FocusAperture {
  focus: number;
  x_um: number;
  y_um: number;
  z_um: number;
  /** sin of the largest angle from the focus to the aperture edge (in air) */
  numericalAperture: number;
}

export interface LayerSummary {
  layer: number;
  datatype: number;
  name: string;
  polygons: number;
  vertices: number;
  drawnArea_um2: number;
  /** drawn area over aperture area */
  drawnFraction: number;
}

export interface NarrowFeature {
  layer: number;
  datatype: number;
  x_um: number;
  y_um: number;
  /** area that an opening by the minimum feature removes, µm² */
  area_um2: number;
}

/** A piece left out of the mask because it was narrower than the sliver width. */
export interface RemovedSliver {
  layer: number;
  datatype: number;
  /** centroid, µm */
  x_um: number;
  y_um: number;
  area_um2: number;
  /** 2·area/perimeter, µm */
  width_um: number;
}

export interface ReportWarning {
  kind: 'narrow-feature' | 'narrow-zone' | 'narrow-gap' | 'sliver';
  message: string;
  x_um?: number;
  y_um?: number;
}

export interface ManufacturabilityReport {
  databaseUnit_m: number;
  userUnit_m: number;
  chordTolerance_um: number;
  maxVertices: number;
  minimumFeature_um: number;
  /** drawn zones crossed by the measuring ray from the design's centre (0.1 rad above +x) */
  zoneCount: number;
  /** the last whole drawn zone on the measuring ray */
  outermostZone: MeasuredWidth | null;
  /** narrowest whole drawn zone seen on 16 rays from the centre */
  narrowestZone: MeasuredWidth | null;
  /** narrowest undrawn gap between two drawn zones on the same rays */
  smallestGap: MeasuredWidth | null;
  numericalApertures: FocusAperture[];
  apertureArea_um2: number;
  /**
   * Fraction of the aperture in state s = 1 (transmitting or π-retarding): for a positive tone the drawn
   * fraction, for a negative tone the rest; for a multi-level design the drawn fraction of mask 1.
   */
  openAreaFraction: number;
  polygonCount: number;
  vertexCount: number;
  largestPolygonVertices: number;
  layers: LayerSummary[];
  narrowFeatureCount: number;
  /** the first narrow features found (at most 200) */
  narrowFeatures: NarrowFeature[];
  /** pieces narrower on average (2·area/perimeter) than this were removed; 0 keeps every piece */
  sliverWidth_um: number;
  /** pieces removed as slivers, on all layers */
  sliverCount: number;
  /** their total area */
  sliverArea_um2: number;
  /** the first removed slivers (at most 200) */
  slivers: RemovedSliver[];
  warnings: ReportWarning[];
  /** filled by the bundle writer */
  files?: { name: string; bytes: number }[];
}
