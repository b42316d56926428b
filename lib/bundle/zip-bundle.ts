import { deflateRawSync } from 'node:zlib';
import { ByteChunks } from '../layout/byte-chunks';
import { concatBytes } from '../layout/concat-bytes';
import { crc32Update } from '../layout/crc32';

export interface BundleEntry {
  name: string;
  data: Uint8Array | string;
}

const LOCAL_HEADER = 0x04034b50;
const CENTRAL_HEADER = 0x02014b50;
const END_OF_CENTRAL_DIRECTORY = 0x06054b50;
const METHOD_STORE = 0;
const METHOD_DEFLATE = 8;
/** general-purpose flag bit 11: names are UTF-8 */
const FLAG_UTF8 = 0x0800;
/** version 2.0 (DEFLATE), made on UNIX (3) */
const VERSION_NEEDED = 20;
const VERSION_MADE_BY = (3 << 8) | 20;
/** rw-r--r-- regular file, in the high half of the external attributes */
const UNIX_FILE_MODE = 0o100644;
const ZIP32_LIMIT = 0xffffffff;

/**
 * The bundle as a zip (PKWARE APPNOTE 6.3: local headers, central directory, end record; no ZIP64),
 * each entry deflated with Node's zlib (stored when that does not shrink it) and dated `timestamp` in UTC,
 * so the same revision always gives the same bytes. Chunks come out entry by entry.
 */
export function* zipChunks(entries: readonly BundleEntry[], timestamp: Date): Generator<Uint8Array> {
  const { time, date } = dosDateTime(timestamp);
  const central = new ByteChunks();
  let offset = 0;
  for (const entry of entries) {
    const raw = typeof entry.data === 'string' ? new TextEncoder().encode(entry.data) : entry.data;
    if (raw.length >= ZIP32_LIMIT) throw new Error(`${entry.name} is larger than 4 GiB; the bundle cannot hold it`);
    const deflated = deflateRawSync(raw, { level: 6 });
    const [method, stored] = deflated.length < raw.length ? [METHOD_DEFLATE, deflated] : [METHOD_STORE, raw];
    const crc = crc32Update(0, raw);
    const name = new TextEncoder().encode(entry.name);
    const header = new ByteChunks(64 + name.length);
    header.u32le(LOCAL_HEADER);
    writeCommon(header, method, time, date, crc, stored.length, raw.length, name.length);
    header.u16le(0);
    header.append(name);
    central.u32le(CENTRAL_HEADER);
    central.u16le(VERSION_MADE_BY);
    writeCommon(central, method, time, date, crc, stored.length, raw.length, name.length);
    central.u16le(0); // extra field
    central.u16le(0); // comment
    central.u16le(0); // disk number
    central.u16le(0); // internal attributes
    central.u32le(UNIX_FILE_MODE * 0x10000);
    central.u32le(offset);
    central.append(name);
    const local = header.take();
    offset += local.length + stored.length;
    if (offset >= ZIP32_LIMIT) throw new Error('the bundle would exceed 4 GiB');
    yield local;
    yield stored;
  }
  const directory = central.take();
  const end = new ByteChunks(22);
  end.u32le(END_OF_CENTRAL_DIRECTORY);
  end.u16le(0);
  end.u16le(0);
  end.u16le(entries.length);
  end.u16le(entries.length);
  end.u32le(directory.length);
  end.u32le(offset);
  end.u16le(0);
  yield directory;
  yield end.take();
}

export function zipBundle(entries: readonly BundleEntry[], timestamp: Date): Uint8Array {
  return concatBytes(zipChunks(entries, timestamp));
}

/** The fields local and central headers share, from "version needed" to the name length. */
function writeCommon(out: ByteChunks, method: number, time: number, date: number, crc: number, compressed: number, size: number, nameLength: number): void {
  out.u16le(VERSION_NEEDED);
  out.u16le(FLAG_UTF8);
  out.u16le(method);
  out.u16le(time);
  out.u16le(date);
  out.u32le(crc);
  out.u32le(compressed);
  out.u32le(size);
  out.u16le(nameLength);
}

/** MS-DOS date and time (2-second resolution, years from 1980), in UTC. */
function dosDateTime(timestamp: Date): { time: number; date: number } {
  const year = Math.min(Math.max(timestamp.getUTCFullYear(), 1980), 2107);
  return {
    time: (timestamp.getUTCHours() << 11) | (timestamp.getUTCMinutes() << 5) | (timestamp.getUTCSeconds() >> 1),
    date: ((year - 1980) << 9) | ((timestamp.getUTCMonth() + 1) << 5) | timestamp.getUTCDate(),
  };
}
