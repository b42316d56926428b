import JSZip from 'jszip';

export interface BundleEntry {
  name: string;
  data: Uint8Array | string;
}

/**
 * The bundle as a zip (DEFLATE), entries in the given order, every entry dated `timestamp`
 * so the same revision always gives the same bytes. jszip compresses entry by entry (streamFiles).
 */
export async function zipBundle(entries: readonly BundleEntry[], timestamp: Date): Promise<Uint8Array> {
  const zip = new JSZip();
  for (const entry of entries) zip.file(entry.name, entry.data, { date: timestamp, binary: typeof entry.data !== 'string' });
  return zip.generateAsync({ type: 'uint8array', compression: 'DEFLATE', compressionOptions: { level: 6 }, streamFiles: true, platform: 'UNIX' });
}
