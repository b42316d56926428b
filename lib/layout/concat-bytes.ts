/** Joins a stream of chunks into one array (the convenience form of the streaming writers). */
export function concatBytes(chunks: Iterable<Uint8Array>): Uint8Array {
  const parts = [...chunks];
  const total = parts.reduce((sum, part) => sum + part.length, 0);
  const out = new Uint8Array(total);
  let offset = 0;
  for (const part of parts) {
    out.set(part, offset);
    offset += part.length;
  }
  return out;
}
