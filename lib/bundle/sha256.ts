import { createHash } from 'node:crypto';

/** SHA-256 of one or more chunks, as lowercase hex. */
export function sha256Hex(...chunks: Uint8Array[]): string {
  const hash = createHash('sha256');
  for (const chunk of chunks) hash.update(chunk);
  return hash.digest('hex');
}
