import { describe, expect, it } from 'vitest';
import { buildExposureMatrix } from '@/lib/layout/exposure-matrix';
import { matrixSpec, squareLibrary } from './fixtures';

describe('exposure matrix', () => {
  it('places distinct variants one column each, arrayed down the rows, each element labelled', () => {
    const spec = matrixSpec([
      { library: squareLibrary(100), caption: 'bias -0.1um' },
      { library: squareLibrary(110), caption: 'bias 0' },
      { library: squareLibrary(120), caption: 'bias +0.1um' },
    ]);
    const matrix = buildExposureMatrix(spec);
    expect(matrix.topCell).toBe('MATRIX');
    expect(matrix.cells.map((c) => c.name)).toEqual(['SQUARE_V0', 'SQUARE_V1', 'SQUARE_V2', 'MATRIX']);
    const top = matrix.cells[3];
    expect(top.placements).toHaveLength(3);
    // pitch: widest variant 120 µm + 10 µm gap; rows: 120 µm + label band (1.6 × 5 µm + 10 µm) + 10 µm gap, downwards
    expect(top.placements.map((p) => [p.columns, p.rows, p.rowStep?.y])).toEqual([[1, 2, -148_000], [1, 2, -148_000], [1, 2, -148_000]]);
    expect(top.placements.map((p) => p.x)).toEqual([50_000, 130_000 + 55_000, 260_000 + 60_000]);
    expect(top.texts.map((t) => t.text)).toEqual([
      'bias -0.1um dose 90%', 'bias -0.1um dose 100%', 'bias 0 dose 90%', 'bias 0 dose 100%', 'bias +0.1um dose 90%', 'bias +0.1um dose 100%',
    ]);
    expect(top.shapes[0].polygons).toHaveLength(6);
    expect(matrix.layers.map((l) => l.purpose)).toEqual(['zones', 'label']);
  });

  it('uses one columns × rows array when every column is the same variant (a dose-only matrix)', () => {
    const library = squareLibrary(50);
    const matrix = buildExposureMatrix(matrixSpec([{ library, caption: 'a' }, { library, caption: 'b' }]));
    expect(matrix.cells.map((c) => c.name)).toEqual(['SQUARE_V0', 'MATRIX']);
    expect(matrix.cells[1].placements).toEqual([
      { cell: 'SQUARE_V0', x: 25_000, y: 25_000, columns: 2, rows: 2, columnStep: { x: 60_000, y: 0 }, rowStep: { x: 0, y: -78_000 } },
    ]);
  });

  it('refuses an empty matrix and variants on different grids', () => {
    expect(() => buildExposureMatrix(matrixSpec([]))).toThrow(/at least one column/);
    const coarse = { ...squareLibrary(10), databaseUnit: 1e-8 };
    expect(() => buildExposureMatrix(matrixSpec([{ library: squareLibrary(10), caption: 'a' }, { library: coarse, caption: 'b' }]))).toThrow(/same database unit/);
  });
});
