import { describe, expect, it } from 'vitest';
import { parameterLabel } from '@/lib/workflow/parameter-label';

describe('parameter paths in words', () => {
  it.each([
    ['foci[1].z', 'Focus 2 · z (µm)'],
    ['foci[0].weight', 'Focus 1 · weight'],
    ['wavelength_um', 'Wavelength (µm)'],
    ['quantization.duty', 'Quantization · duty cycle'],
    ['process.layerMap[2].datatype', 'Process · layer-map row 3 · datatype'],
    ['processProfile.minimumFeature', 'Process · minimum feature (µm)'],
    ['settings.maxVerticesPerPolygon', 'Export · vertex cap per polygon'],
    // a key the table does not know yet still reads as words
    ['quantization.someNewField_um', 'Quantization · some new field (µm)'],
  ])('%s reads "%s"', (path, label) => {
    expect(parameterLabel(path)).toBe(label);
  });
});
