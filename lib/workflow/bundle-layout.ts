/**
 * Reads what a revision actually released: its bundle's manifest and the mask geometry from the
 * bundle's GDSII file (the writers' reader), so Compare shows differences in the stored files.
 */
import JSZip from 'jszip';
import { readGdsii } from '../gdsii';
import type { LayoutLibrary } from '../layout/types';

export interface BundleLayout {
  manifest: Record<string, unknown> | null;
  gdsiiName: string;
  library: LayoutLibrary;
}

export class BundleReadError extends Error {}

export async function readBundleLayout(zipBytes: Uint8Array): Promise<BundleLayout> {
  let zip: JSZip;
  try {
    zip = await JSZip.loadAsync(zipBytes);
  } catch {
    throw new BundleReadError('The stored bundle is not a readable zip file.');
  }
  const gds = Object.values(zip.files).find((f) => !f.dir && /\.gds(ii)?$/i.test(f.name));
  if (!gds) throw new BundleReadError('The stored bundle holds no GDSII file.');
  const manifestFile = zip.file('manifest.json');
  let manifest: Record<string, unknown> | null = null;
  if (manifestFile) {
    try {
      manifest = JSON.parse(await manifestFile.async('string')) as Record<string, unknown>;
    } catch {
      throw new BundleReadError('The manifest in the stored bundle is not valid JSON.');
    }
  }
  let library: LayoutLibrary;
  try {
    library = readGdsii(await gds.async('uint8array'));
  } catch (error) {
    throw new BundleReadError(`The GDSII file ${gds.name} in the bundle could not be read: ${error instanceof Error ? error.message : String(error)}`);
  }
  return { manifest, gdsiiName: gds.name, library };
}
