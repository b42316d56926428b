import type { DesignedFocus, Quantization } from '../design/types';
import type { LayerMeaning } from './layer-meaning';

export interface BundleFile {
  name: string;
  bytes: number;
  sha256: string;
}

/** One exposure-matrix column as drawn: its variant and figures measured on its own geometry (after its bias). */
export interface MatrixColumnManifest {
  caption: string;
  /** binary duty cycle of the column; null keeps the design's */
  duty: number | null;
  /** size bias, µm: the change in width of every drawn feature (see biasConvention); null for none */
  bias_um: number | null;
  /** drawn zone or level layers of the column's cell */
  layers: Array<{ layer: number; datatype: number; polygons: number; vertices: number; drawnArea_um2: number }>;
  /** as the report's openAreaFraction, measured on this column's polygons */
  openAreaFraction: number;
  /** drawn shapes (zones) a negative bias erased */
  zonesLost: number;
  /** drawn shapes (zones) a positive bias joined to a neighbour */
  zonesMerged: number;
  /** the report's narrowest zone and smallest gap (16 rays) shifted by +bias and −bias; null when none is left */
  narrowestZone_um: number | null;
  smallestGap_um: number | null;
  warnings: string[];
}

/** manifest.json: everything a reader needs to interpret the other files of the bundle. */
export interface BundleManifest {
  format: 'zonewright-bundle/1';
  design: { name: string; id: string | null };
  revision: { number: number | null; id: string | null };
  createdAt: string;
  engineVersion: string;
  source: string;
  wavelength: { micrometres: number; nanometres: number };
  units: {
    lengthsIn: 'micrometres';
    userUnitMetres: number;
    databaseUnitMetres: number;
    databaseGridMicrometres: number;
  };
  settings: { chordToleranceMicrometres: number; maxVerticesPerPolygon: number; minimumFeatureMicrometres: number };
  quantization: Quantization;
  layers: Array<{ layer: number; datatype: number; name: string; purpose: string } & LayerMeaning>;
  foci: DesignedFocus[];
  exposureMatrix: {
    /** the column captions, left to right */
    columns: string[];
    rows: string[];
    /** what a column's bias_um means, in words */
    biasConvention: string;
    variants: MatrixColumnManifest[];
  } | null;
  topCell: string;
  report: unknown;
  files: BundleFile[];
}
