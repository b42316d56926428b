/** Record identifiers of SEMI P39 (OASIS) used by the writer. */
export const RecordId = {
  PAD: 0,
  START: 1,
  END: 2,
  CELLNAME_IMPLICIT: 3,
  CELL_BY_REFERENCE: 13,
  PLACEMENT: 17,
  TEXT: 19,
  POLYGON: 21,
  CBLOCK: 34,
} as const;

export const MAGIC = '%SEMI-OASIS\r\n';
/** The END record is always 256 bytes long (SEMI P39, END record). */
export const END_RECORD_BYTES = 256;
export const VALIDATION_CRC32 = 1;
/** CBLOCK compression type 0: raw DEFLATE (RFC 1951), no zlib header. */
export const COMPRESSION_DEFLATE = 0;
