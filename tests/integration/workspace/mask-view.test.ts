/**
 * Pure parts of the mask view and the history table (no database): placement expansion against the
 * GDSII reference transform, screen/mask round trips, scale-bar steps, history sorting and filtering.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { flattenLibrary } from '@/components/mask-view/flatten';
import { fitBounds, scaleBar, toMask, toScreen, zoomAt } from '@/components/mask-view/viewport';
import { viewHistory } from '@/components/workspace/history';
import type { RevisionRow } from '@/components/workspace/types';
import type { LayoutLibrary } from '@/lib/layout/types';

// A 1 µm × 2 µm rectangle at the origin, in 1 nm database units.
const rect = new Int32Array([0, 0, 1000, 0, 1000, 2000, 0, 2000]);

function library(placement: LayoutLibrary['cells'][number]['placements'][number]): LayoutLibrary {
  return {
    name: 'T',
    databaseUnit: 1e-9,
    userUnit: 1e-6,
    layers: [{ layer: 1, datatype: 0, name: 'zones', purpose: 'zones' }],
    topCell: 'TOP',
    cells: [
      { name: 'R', shapes: [{ layer: 1, datatype: 0, polygons: [rect] }], texts: [], placements: [] },
      { name: 'TOP', shapes: [], texts: [], placements: [placement] },
    ],
  };
}

describe('flattenLibrary', () => {
  it('expands a 3 × 2 array with its column and row steps, in µm', () => {
    const flat = flattenLibrary(library({ cell: 'R', x: 5000, y: 0, columns: 3, rows: 2, columnStep: { x: 10_000, y: 0 }, rowStep: { x: 0, y: 20_000 } }));
    expect(flat.layers[0].polygons).toHaveLength(6);
    expect(flat.bounds).toEqual({ x0: 5, y0: 0, x1: 26, y1: 22 });
    expect(flat.truncated).toBe(false);
  });

  it('mirrors about x before rotating, as GDSII STRANS/ANGLE do (GDSII Stream Format 6.0, from memory)', () => {
    // Mirror: (x, y) → (x, −y); then 90° counter-clockwise: (x, y) → (−y, x). The corner (1, 2) µm goes to (2, 1).
    const flat = flattenLibrary(library({ cell: 'R', x: 0, y: 0, rotation: 90, mirrorX: true }));
    const p = Array.from(flat.layers[0].polygons[0]);
    expect(p.slice(4, 6)).toEqual([2, 1]);
    expect(flat.bounds).toEqual({ x0: 0, y0: 0, x1: 2, y1: 1 });
  });

  it('stops at the vertex budget and says so', () => {
    const flat = flattenLibrary(library({ cell: 'R', x: 0, y: 0, columns: 100, rows: 100, columnStep: { x: 2000, y: 0 }, rowStep: { x: 0, y: 3000 } }), 400);
    expect(flat.truncated).toBe(true);
    expect(flat.vertexCount).toBe(400);
  });
});

describe('viewport', () => {
  it('maps mask points to the screen and back', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.double({ min: 1e-3, max: 1e3, noNaN: true }), (x, y, zoom) => {
        const v = { cx: 12, cy: -7, pxPerUm: zoom };
        const [sx, sy] = toScreen(v, 800, 600, x, y);
        const [mx, my] = toMask(v, 800, 600, sx, sy);
        return Math.abs(mx - x) <= 1e-9 * (1 + Math.abs(x)) && Math.abs(my - y) <= 1e-9 * (1 + Math.abs(y));
      }),
    );
  });

  it('keeps the point under the cursor fixed while zooming', () => {
    const v = fitBounds({ x0: -230, y0: -230, x1: 230, y1: 230 }, 800, 600);
    const before = toMask(v, 800, 600, 123, 456);
    const after = toMask(zoomAt(v, 800, 600, 123, 456, 3, { min: 0, max: 1e9 }), 800, 600, 123, 456);
    expect(after[0]).toBeCloseTo(before[0], 9);
    expect(after[1]).toBeCloseTo(before[1], 9);
  });

  it('fits a 460 µm aperture inside the margins', () => {
    const v = fitBounds({ x0: -230, y0: -230, x1: 230, y1: 230 }, 800, 600, 24);
    expect(v.pxPerUm).toBeCloseTo((600 - 48) / 460, 12);
  });

  it.each([
    [1, '100 µm', 100],
    [0.5, '200 µm', 100],
    [20, '5 µm', 100],
    [400, '200 nm', 80],
    [0.05, '2 mm', 100],
  ])('at %f px/µm the scale bar reads %s', (pxPerUm, label, px) => {
    const bar = scaleBar(pxPerUm, 120);
    expect(bar.label).toBe(label);
    expect(bar.lengthPx).toBeCloseTo(px, 9);
    expect(bar.lengthPx).toBeLessThanOrEqual(120);
  });
});

function row(number: number, over: Partial<RevisionRow> = {}): RevisionRow {
  return {
    id: `r${number}`,
    number,
    authorName: 'Tomas',
    message: `revision ${number}`,
    state: 'draft',
    buildStatus: 'ready',
    buildProgress: 1,
    buildStage: 'done',
    buildError: null,
    zoneCount: 100 + number,
    narrowestFeature: 0.5,
    bundleBytes: 1000 * number,
    bundleSha256: null,
    createdAt: `2026-12-01T10:0${number}:00.000Z`,
    ...over,
  };
}

describe('history view', () => {
  const rows = [row(1), row(2, { state: 'in_review', zoneCount: null, authorName: 'Priya' }), row(3, { message: 'Near focus moved' })];

  it('sorts by a column either way, rows without a value last', () => {
    const byZones = (descending: boolean) => viewHistory(rows, { sortBy: 'zones', descending, text: '', state: '' }).map((r) => r.number);
    expect(byZones(true)).toEqual([3, 1, 2]);
    expect(byZones(false)).toEqual([1, 3, 2]);
  });

  it('filters by state and by text in message or author', () => {
    expect(viewHistory(rows, { sortBy: 'number', descending: true, text: '', state: 'in_review' }).map((r) => r.number)).toEqual([2]);
    expect(viewHistory(rows, { sortBy: 'number', descending: true, text: 'near', state: '' }).map((r) => r.number)).toEqual([3]);
    expect(viewHistory(rows, { sortBy: 'number', descending: true, text: 'priya', state: '' }).map((r) => r.number)).toEqual([2]);
  });
});
