import type { DesignedFocus, Quantization } from '../design/types';
import type { LayerMeaning } from './layer-meaning';

export interface BundleFile {
  name: string;
  bytes: number;
  sha256: string;
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
  exposureMatrix: { columns: string[]; rows: string[] } | null;
  topCell: string;
  report: unknown;
  files: BundleFile[];
}
