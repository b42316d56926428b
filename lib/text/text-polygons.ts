import { parse, type Font } from 'opentype.js';
import { flattenOutline, type OutlineCommand } from './flatten-path';
import { holeFreePolygons } from './hole-free';

/** Parses a font file (WOFF, OTF or TTF bytes); the caller reads the file, so this stays pure. */
export function loadLabelFont(bytes: Uint8Array): Font {
  try {
    return parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
  } catch (error) {
    throw new Error(`the label font could not be read: ${error instanceof Error ? error.message : String(error)}`);
  }
}

export interface TextPlacement {
  text: string;
  /** left end of the baseline, µm */
  x: number;
  y: number;
  /** height of a capital letter, µm */
  height: number;
}

export interface TextGeometryOptions {
  /** size of one database unit in µm, e.g. 0.001 */
  databaseUnit: number;
  /** largest departure of a flattened curve from the glyph outline, µm */
  chordTolerance: number;
}

/** Printable ASCII: the characters the shipped font covers and every pattern generator's label accepts. */
const PRINTABLE = /^[\x20-\x7e]+$/;

/**
 * Text as hole-free polygons in database units: glyph outlines flattened to the chord tolerance, snapped to the grid,
 * merged, with the holes of letters such as e, o, 0 cut open so each polygon is a simple outline.
 */
export function textPolygons(font: Font, placement: TextPlacement, options: TextGeometryOptions): Int32Array[] {
  if (!PRINTABLE.test(placement.text)) throw new Error(`label "${placement.text}": only printable ASCII characters can be written on the mask`);
  if (!(placement.height > 0)) throw new Error(`label "${placement.text}": the height must be a positive length`);
  const capHeight = (font.tables.os2 as { sCapHeight?: number } | undefined)?.sCapHeight || font.unitsPerEm * 0.7;
  const fontSize = (placement.height * font.unitsPerEm) / capHeight;
  // opentype.js draws with y down; flip to the mask's y up while converting to database units
  const path = font.getPath(placement.text, 0, 0, fontSize);
  const scale = 1 / options.databaseUnit;
  const commands = (path.commands as OutlineCommand[]).map((c) => toMask(c, placement.x, placement.y, scale));
  const contours = flattenOutline(commands, Math.max(options.chordTolerance * scale, 0.5)).map((contour) => contour.map(Math.round));
  return holeFreePolygons(contours);
}

function toMask(command: OutlineCommand, x0: number, y0: number, scale: number): OutlineCommand {
  const px = (x: number) => (x0 + x) * scale;
  const py = (y: number) => (y0 - y) * scale;
  switch (command.type) {
    case 'Z':
      return command;
    case 'M':
    case 'L':
      return { type: command.type, x: px(command.x), y: py(command.y) };
    case 'Q':
      return { type: 'Q', x1: px(command.x1), y1: py(command.y1), x: px(command.x), y: py(command.y) };
    case 'C':
      return { type: 'C', x1: px(command.x1), y1: py(command.y1), x2: px(command.x2), y2: py(command.y2), x: px(command.x), y: py(command.y) };
  }
}

/** Advance width of the text in µm at the given capital height, for laying labels out. */
export function textWidth(font: Font, text: string, height: number): number {
  const capHeight = (font.tables.os2 as { sCapHeight?: number } | undefined)?.sCapHeight || font.unitsPerEm * 0.7;
  return font.getAdvanceWidth(text, (height * font.unitsPerEm) / capHeight);
}
