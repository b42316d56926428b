import type { BundleLayer } from '@/db/queries/fab';
import type { ProcessProfile } from '@/lib/schemas/designs';

export interface FabItemView {
  revisionId: string;
  number: number;
  state: string;
  message: string;
  designName: string;
  teamName: string;
  role: string;
  profile: ProcessProfile;
  layers: BundleLayer[];
  bundleSha256: string | null;
  bundleBytes: number | null;
  zoneCount: number | null;
  narrowestFeature: number | null;
  createdAt: string;
}

export interface FabRunRow {
  id: string;
  revisionId: string;
  runDate: string;
  tool: string;
  dose: number;
  doseUnit: string;
  focus: number;
  resist: string;
  resistThickness: number;
  notes: string;
  recordedByName: string | null;
  photos: { id: string; fileName: string; width: number; height: number }[];
}
