import type { BundleLayer, FabPhotoSummary, FabRunView } from '@/db/queries/fab';
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

/** A recorded run as the page hands it to the client: the query's view without the record time, photos without their MIME type. */
export type FabRunRow = Omit<FabRunView, 'createdAt' | 'photos'> & { photos: Omit<FabPhotoSummary, 'mimeType'>[] };
