import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { flattenOutline, loadLabelFont, textPolygons } from '@/lib/text';
import { selfIntersects, signedArea } from './geometry-checks';

const font = loadLabelFont(readFileSync(path.resolve(__dirname, '../../../fonts/jetbrains-mono-latin-400-normal.woff')));
const grid = { databaseUnit: 0.001, chordTolerance: 0.005 };

/**
 * The glyph's area straight from its outline: by Green's theorem the signed areas of a glyph's contours add up to
 * its inked area (holes run the other way). Flattened finely (0.01 font units) in font units, scaled to µm.
 */
function outlineArea(text: string, capHeight: number): number {
  const size = font.unitsPerEm;
  const commands = font.getPath(text, 0, 0, size).commands as Parameters<typeof flattenOutline>[0];
  const raw = flattenOutline(commands, 0.01).reduce((sum, contour) => sum + signedArea(contour), 0);
  const scale = capHeight / (font.tables.os2 as unknown as { sCapHeight: number }).sCapHeight;
  return Math.abs(raw) * scale * scale;
}

describe('text labels as polygons', () => {
  it.each(['o', 'e', '0', '8', 'B', 'R7 dose 110%'])('"%s" comes out as simple polygons with the outline\'s area', (text) => {
    const polygons = textPolygons(font, { text, x: 5, y: -3, height: 10 }, grid);
    expect(polygons.length).toBeGreaterThan(0);
    for (const polygon of polygons) {
      expect(selfIntersects(polygon)).toBe(false);
      expect(signedArea(polygon)).toBeGreaterThan(0);
    }
    const area = polygons.reduce((sum, p) => sum + signedArea(p), 0) * 1e-6;
    // chords lie inside convex curve pieces and outside concave ones, each by at most 5 nm, plus grid rounding: 0.2% covers it
    expect(Math.abs(area - outlineArea(text, 10)) / outlineArea(text, 10)).toBeLessThan(0.002);
  });

  it('cuts the hole of an "o" open: at least two pieces, none with a hole', () => {
    // one simple polygon cannot cover a ring without a keyhole; holeFree must give two or more
    expect(textPolygons(font, { text: 'o', x: 0, y: 0, height: 10 }, grid).length).toBeGreaterThanOrEqual(2);
  });

  it('places text at its baseline start with the requested capital height', () => {
    const polygons = textPolygons(font, { text: 'H', x: 100, y: 50, height: 20 }, grid);
    const ys = polygons.flatMap((p) => [...p].filter((_, i) => i % 2 === 1));
    const xs = polygons.flatMap((p) => [...p].filter((_, i) => i % 2 === 0));
    expect(Math.min(...ys)).toBe(50_000);
    expect(Math.max(...ys)).toBe(70_000);
    expect(Math.min(...xs)).toBeGreaterThan(100_000);
  });

  it('refuses characters the mask cannot carry, with a clear message', () => {
    expect(() => textPolygons(font, { text: 'λ = 405 nm', x: 0, y: 0, height: 10 }, grid)).toThrow(/only printable ASCII/);
    expect(() => textPolygons(font, { text: 'A', x: 0, y: 0, height: 0 }, grid)).toThrow(/height must be a positive length/);
  });
});
