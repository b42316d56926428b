import { deflateRaw } from 'pako';
import { ByteChunks } from '../layout/byte-chunks';
import { concatBytes } from '../layout/concat-bytes';
import type { LayoutLibrary } from '../layout/types';
import { validateLibrary } from '../layout/validate-library';
import { cellElementRecords } from './cell-records';
import { crc32Update } from '../layout/crc32';
import { encoded, writeReal, writeString, writeUnsigned } from './encoding';
import { freshModalState } from './modal-state';
import { COMPRESSION_DEFLATE, END_RECORD_BYTES, MAGIC, RecordId, VALIDATION_CRC32 } from './record-ids';

export interface OasisOptions {
  /** wrap each cell's records in CBLOCKs (raw DEFLATE) */
  compress?: boolean;
  /** uncompressed bytes gathered before a chunk is handed out (or a CBLOCK closed) */
  chunkBytes?: number;
}

/**
 * Writes a library as an OASIS file (SEMI P39), one chunk at a time, with the same geometry as the GDSII writer.
 * Layout: magic, START (version 1.0, unit, table offsets in END), the CELLNAME table (implicit reference numbers,
 * strict), one CELL per cell, and a 256-byte END holding the table offsets and a CRC32 signature computed over
 * every byte of the file up to and including the validation-scheme byte.
 */
export function* oasisChunks(library: LayoutLibrary, options: OasisOptions = {}): Generator<Uint8Array> {
  validateLibrary(library);
  const chunkBytes = options.chunkBytes ?? 1 << 20;
  const out = new ByteChunks();
  let crc = 0;
  let written = 0;
  const drain = (): Uint8Array => {
    const chunk = out.take();
    crc = crc32Update(crc, chunk);
    written += chunk.length;
    return chunk;
  };

  for (let i = 0; i < MAGIC.length; i++) out.u8(MAGIC.charCodeAt(i));
  writeUnsigned(out, RecordId.START);
  writeString(out, '1.0');
  // unit: database units per micrometre
  writeReal(out, roundIfClose(1e-6 / library.databaseUnit));
  writeUnsigned(out, 1);

  const cellNameTableOffset = written + out.length;
  const numbers = new Map<string, number>();
  library.cells.forEach((cell, index) => {
    numbers.set(cell.name, index);
    writeUnsigned(out, RecordId.CELLNAME_IMPLICIT);
    writeString(out, cell.name);
  });
  const cellNumber = (name: string): number => numbers.get(name) as number;

  for (const cell of library.cells) {
    writeUnsigned(out, RecordId.CELL_BY_REFERENCE);
    writeUnsigned(out, cellNumber(cell.name));
    const modal = freshModalState();
    if (!options.compress) {
      for (const _ of cellElementRecords(out, cell, modal, cellNumber)) {
        if (out.length >= chunkBytes) yield drain();
      }
      continue;
    }
    // modal variables carry across CBLOCKs, so a large cell may span several
    const body = new ByteChunks();
    for (const _ of cellElementRecords(body, cell, modal, cellNumber)) {
      if (body.length >= chunkBytes) {
        writeCompressedBlock(out, body.take());
        yield drain();
      }
    }
    if (body.length > 0) writeCompressedBlock(out, body.take());
    if (out.length >= chunkBytes) yield drain();
  }

  yield drain();
  const end = endRecord(cellNameTableOffset);
  crc = crc32Update(crc, end);
  const signature = encoded((sink) => sink.u32le(crc));
  yield concatBytes([end, signature]);
}

export function writeOasis(library: LayoutLibrary, options: OasisOptions = {}): Uint8Array {
  return concatBytes(oasisChunks(library, options));
}

function writeCompressedBlock(out: ByteChunks, raw: Uint8Array): void {
  const compressed = deflateRaw(raw);
  writeUnsigned(out, RecordId.CBLOCK);
  writeUnsigned(out, COMPRESSION_DEFLATE);
  writeUnsigned(out, raw.length);
  writeUnsigned(out, compressed.length);
  out.append(compressed);
}

/**
 * END up to and including the validation-scheme byte (the 4-byte signature follows):
 * table offsets for CELLNAME (strict), TEXTSTRING, PROPNAME, PROPSTRING, LAYERNAME, XNAME (none of the others
 * are written), then a padding b-string sized so the whole record is 256 bytes.
 */
function endRecord(cellNameTableOffset: number): Uint8Array {
  const head = encoded((sink) => {
    writeUnsigned(sink, RecordId.END);
    writeUnsigned(sink, 1);
    writeUnsigned(sink, cellNameTableOffset);
    for (let table = 0; table < 5; table++) {
      writeUnsigned(sink, 0);
      writeUnsigned(sink, 0);
    }
  });
  const signatureBytes = 4;
  const schemeBytes = 1;
  let padding = END_RECORD_BYTES - head.length - schemeBytes - signatureBytes - 1;
  while (head.length + encoded((s) => writeUnsigned(s, padding)).length + padding + schemeBytes + signatureBytes > END_RECORD_BYTES) padding--;
  return encoded((sink) => {
    sink.append(head);
    writeUnsigned(sink, padding);
    sink.append(new Uint8Array(padding));
    writeUnsigned(sink, VALIDATION_CRC32);
  });
}

/** 1e-6 / 1e-9 is 999.9999999999999 in doubles; the unit is meant as the whole number 1000. */
function roundIfClose(value: number): number {
  const rounded = Math.round(value);
  return Math.abs(value - rounded) < 1e-9 * Math.max(1, Math.abs(value)) ? rounded : value;
}
