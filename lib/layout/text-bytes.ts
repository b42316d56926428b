/** UTF-8 bytes of a stream of text pieces, encoded in batches of about `batchChars` characters. */
export function* textBytes(pieces: Iterable<string>, batchChars = 1 << 20): Generator<Uint8Array> {
  const encoder = new TextEncoder();
  let batch: string[] = [];
  let size = 0;
  for (const piece of pieces) {
    batch.push(piece);
    size += piece.length;
    if (size >= batchChars) {
      yield encoder.encode(batch.join(''));
      batch = [];
      size = 0;
    }
  }
  if (batch.length > 0) yield encoder.encode(batch.join(''));
}
