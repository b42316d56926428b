import { describe, expect, it } from 'vitest';
import JSZip from 'jszip';
import { writeGdsii } from '@/lib/gdsii';
import type { LayoutCell, LayoutLibrary } from '@/lib/layout/types';
import { readBundleLayout } from '@/lib/workflow/bundle-layout';
import { geometryDifference, manifestLayerNames } from '@/lib/workflow/geometry-difference';

// 1 nm database unit: a rectangle from (x0, y0) to (x1, y1) µm as DBU corners.
const rect = (x0: number, y0: number, x1: number, y1: number) => Int32Array.from([x0, y0, x1, y0, x1, y1, x0, y1].map((v) => v * 1000));

function library(cells: LayoutCell[]): LayoutLibrary {
  return {
    name: 'TEST',
    databaseUnit: 1e-9,
    userUnit: 1e-6,
    layers: [{ layer: 1, datatype: 0, name: 'zones', purpose: 'zones' }],
    cells,
    topCell: cells[0].name,
  };
}

const cell = (name: string, shapes: LayoutCell['shapes'], placements: LayoutCell['placements'] = []): LayoutCell => ({ name, shapes, texts: [], placements });

async function bundle(lib: LayoutLibrary): Promise<Uint8Array> {
  const zip = new JSZip();
  zip.file('manifest.json', JSON.stringify({ layers: [{ layer: 1, datatype: 0, name: 'zones', purpose: 'zones' }] }));
  zip.file('mask.gds', writeGdsii(lib, { timestamp: new Date(Date.UTC(2026, 0, 1)) }));
  return zip.generateAsync({ type: 'uint8array' });
}

describe('geometryDifference', () => {
  // Hand geometry: a 10 × 5 µm rectangle moved 2 µm along x gains a 2 × 5 µm strip and loses one,
  // 10 µm² each; a new 3 × 3 µm square on another layer is 9 µm² added.
  const before = library([cell('TOP', [{ layer: 1, datatype: 0, polygons: [rect(0, 0, 10, 5)] }])]);
  const after = library([
    cell('TOP', [
      { layer: 1, datatype: 0, polygons: [rect(2, 0, 12, 5)] },
      { layer: 2, datatype: 0, polygons: [rect(20, 20, 23, 23)] },
    ]),
  ]);

  it('gives the areas added and removed per layer, read back through GDSII in a zip', async () => {
    const a = await readBundleLayout(await bundle(before));
    const b = await readBundleLayout(await bundle(after));
    expect(a.gdsiiName).toBe('mask.gds');
    const d = geometryDifference(a.library, b.library, { layerNames: manifestLayerNames(a.manifest, b.manifest) });
    expect(d.layers.map((l) => l.name)).toEqual(['zones (1/0)', '2/0']);
    expect(d.layers.map((l) => [l.layer, l.datatype, l.addedArea, l.removedArea])).toEqual([
      [1, 0, 10, 10],
      [2, 0, 9, 0],
    ]);
    expect(d.bounds).toEqual({ x0: 0, y0: 0, x1: 23, y1: 23 });
    expect(d.truncated).toBe(false);
    // the strip added on layer 1 lies between x = 10 and 12 µm
    const xs = d.layers[0].added[0].filter((_, i) => i % 2 === 0);
    expect([Math.min(...xs), Math.max(...xs)]).toEqual([10, 12]);
  });

  it('expands placements so arrayed cells are compared too', () => {
    const placed = library([
      cell('TOP', [], [{ cell: 'UNIT', x: 2000, y: 0 }]),
      cell('UNIT', [{ layer: 1, datatype: 0, polygons: [rect(0, 0, 10, 5)] }]),
    ]);
    const d = geometryDifference(after, placed);
    expect(d.layers.find((l) => l.layer === 1)).toMatchObject({ addedArea: 0, removedArea: 0 });
  });

  it('cuts the overlay to the vertex budget but keeps the areas whole', () => {
    const d = geometryDifference(before, after, { vertexBudget: 4 });
    expect(d.truncated).toBe(true);
    expect(d.shownVertices).toBeLessThanOrEqual(4);
    expect(d.layers[0].addedArea).toBe(10);
  });

  it('finds nothing between identical masks', () => {
    const d = geometryDifference(before, before);
    expect(d.layers.every((l) => l.addedArea === 0 && l.removedArea === 0)).toBe(true);
  });

  it('says plainly when a bundle is not a zip or holds no GDSII', async () => {
    await expect(readBundleLayout(new Uint8Array([1, 2, 3]))).rejects.toThrow('not a readable zip');
    const zip = new JSZip();
    zip.file('README.txt', 'x');
    await expect(readBundleLayout(await zip.generateAsync({ type: 'uint8array' }))).rejects.toThrow('holds no GDSII');
  });
});
