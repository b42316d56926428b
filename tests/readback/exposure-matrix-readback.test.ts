import { describe, expect, it } from 'vitest';
import { writeGdsii } from '@/lib/gdsii';
import { buildExposureMatrix } from '@/lib/layout/exposure-matrix';
import { writeOasis } from '@/lib/oasis';
import { matrixSpec, squareLibrary } from '../unit/writers/fixtures';
import { gdspySummary, klayoutCompare, scratchDirectory, writeScratch } from './tools';

describe('exposure matrix read back', () => {
  const matrix = buildExposureMatrix(
    matrixSpec([
      { library: squareLibrary(100), caption: 'bias -0.1um' },
      { library: squareLibrary(110), caption: 'bias 0' },
      { library: squareLibrary(120), caption: 'bias +0.1um' },
    ]),
  );
  const directory = scratchDirectory();
  const gds = writeScratch(directory, 'matrix.gds', writeGdsii(matrix));
  const oas = writeScratch(directory, 'matrix.oas', writeOasis(matrix));

  it('gdspy expands the AREFs into 3 × 2 squares of the right sizes and finds six labels', () => {
    // gdspy, a general-purpose GDSII library: 2 rows each of 100², 110², 120² µm squares
    const summary = gdspySummary(gds);
    expect(summary.tops).toEqual(['MATRIX']);
    expect(summary.layers['1/0'].polygons).toBe(6);
    expect(summary.layers['1/0'].area).toBeCloseTo(2 * (100 ** 2 + 110 ** 2 + 120 ** 2), 6);
    expect(summary.layers['10/0'].polygons).toBe(6);
    expect(new Set(summary.labels).size).toBe(6);
  });

  it('KLayout finds the OASIS repetitions equal to the GDSII arrays (empty XOR)', () => {
    const comparison = klayoutCompare(gds, oas);
    for (const layer of Object.values(comparison.layers)) {
      expect(layer.xorEmpty).toBe(true);
      expect(layer.oasPolygons).toBe(layer.gdsPolygons);
    }
    expect(comparison.oasTexts).toEqual(comparison.gdsTexts);
  });
});
