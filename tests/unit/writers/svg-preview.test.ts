import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { writeSvg } from '@/lib/svg';
import { handBuiltLibrary } from './fixtures';

/** Parses the SVG with Python's xml.etree (an outside XML parser) and reports what it found. */
function inspect(svg: string): { viewBox: string; layers: Array<{ id: string; fill: string }>; paths: number; uses: number; texts: string[] } {
  const script = `
import json, sys, xml.etree.ElementTree as ET
ns = {"s": "http://www.w3.org/2000/svg"}
root = ET.fromstring(sys.stdin.read())
layers = [{"id": g.get("id"), "fill": g.get("fill")} for g in root.iter("{http://www.w3.org/2000/svg}g") if (g.get("id") or "").startswith("layer-")]
print(json.dumps({
  "viewBox": root.get("viewBox"),
  "layers": layers,
  "paths": len(list(root.iter("{http://www.w3.org/2000/svg}path"))),
  "uses": len(list(root.iter("{http://www.w3.org/2000/svg}use"))),
  "texts": [t.text for t in root.iter("{http://www.w3.org/2000/svg}text")],
}))`;
  return JSON.parse(execFileSync('/usr/bin/python3', ['-c', script], { input: svg, encoding: 'utf8' }));
}

describe('SVG preview', () => {
  const library = handBuiltLibrary();
  const found = inspect(writeSvg(library, { title: 'hand-built r1' }));

  it('is well-formed XML with a viewBox in µm around the drawing', () => {
    // the drawing spans x −100…106 µm and y −100…235 µm (fixture); 5% margins of the larger side (335 µm) = 16.75 µm
    const [x, y, width] = found.viewBox.split(' ').map(Number);
    expect(x).toBeCloseTo(-100 - 16.75, 6);
    expect(y).toBeCloseTo(-235 - 16.75, 6);
    expect(width).toBeCloseTo(206 + 2 * 16.75, 6);
  });

  it('has one group per layer: zones in chrome, the label layer in a distinct colour-blind-safe hue', () => {
    expect(found.layers).toEqual([
      { id: 'layer-1-0', fill: '#2b2d42' },
      { id: 'layer-10-0', fill: '#0072b2' },
    ]);
  });

  it('draws each polygon once and each placement by reference', () => {
    // 5 polygons in the fixture's cells; per layer (2): 1 (plain) + 1 (rotated) + 6 (array) uses, plus 1 use per layer group
    expect(found.paths).toBe(5);
    expect(found.uses).toBe(2 * 8 + 2);
  });

  it('carries a title, a legend entry per layer and a scale bar with its unit', () => {
    expect(found.texts).toEqual(['hand-built r1', '1/0 zones (zones)', '10/0 label (label)', '20 µm']);
  });
});
