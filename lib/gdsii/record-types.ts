/** Record types and data types of the GDSII Stream Format Manual, release 6.0 (the ones we write or read). */
export const RecordType = {
  HEADER: 0x00,
  BGNLIB: 0x01,
  LIBNAME: 0x02,
  UNITS: 0x03,
  ENDLIB: 0x04,
  BGNSTR: 0x05,
  STRNAME: 0x06,
  ENDSTR: 0x07,
  BOUNDARY: 0x08,
  PATH: 0x09,
  SREF: 0x0a,
  AREF: 0x0b,
  TEXT: 0x0c,
  LAYER: 0x0d,
  DATATYPE: 0x0e,
  WIDTH: 0x0f,
  XY: 0x10,
  ENDEL: 0x11,
  SNAME: 0x12,
  COLROW: 0x13,
  TEXTTYPE: 0x16,
  PRESENTATION: 0x17,
  STRING: 0x19,
  STRANS: 0x1a,
  MAG: 0x1b,
  ANGLE: 0x1c,
} as const;

export const DataType = {
  NONE: 0,
  BITS: 1,
  INT16: 2,
  INT32: 3,
  REAL8: 5,
  ASCII: 6,
} as const;

/** A record's length field is 16 bits and counts its 4-byte header. */
export const MAX_RECORD_BYTES = 65534;
/** Points in one XY record, the closing point included: (65534 − 4) / 8. */
export const MAX_XY_POINTS = 8191;
/** STRANS bit for reflection about the x-axis, applied before rotation. */
export const STRANS_REFLECT = 0x8000;
