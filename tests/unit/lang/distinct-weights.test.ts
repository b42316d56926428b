import { describe, expect, it } from 'vitest';
import { distinctWeights, EQUAL_WEIGHT_STEP } from '@/lib/lang/eval/distinct-weights';
import { compileScript } from '@/lib/lang';

describe('the weights a combination is drawn with', () => {
  it('lowers the second of two equal weights by 1e-4 of it, and leaves every other set alone', () => {
    expect(Array.from(distinctWeights([0.5, 0.5]))).toEqual([0.5, 0.5 * (1 - EQUAL_WEIGHT_STEP)]);
    expect(Array.from(distinctWeights([1, 0, 1]))).toEqual([1, 0, 1 - EQUAL_WEIGHT_STEP]);
    expect(Array.from(distinctWeights([0.6, 0.4]))).toEqual([0.6, 0.4]);
    expect(Array.from(distinctWeights([1, 1, 1]))).toEqual([1, 1, 1]);
  });

  it('keeps the user’s weights for the foci while the field never vanishes', () => {
    const result = compileScript(`wavelength 405 nm
aperture circle(diameter: 200 um)
profile superpose(wave(lens(focal: 800 um, centre: (-40 um, 0 um)), weight: 1), wave(lens(focal: 1.2 mm, centre: (60 um, 25 um)), weight: 1))
quantize binary(duty: 0.5)
`);
    if (!result.ok) throw new Error(result.diagnostics[0].message);
    expect(result.design.foci.map((f) => f.weight)).toEqual([1, 1]);
    // where the two lenses are out of phase, |u| = |1 − (1 − 1e-4)| = 1e-4 at least (triangle inequality)
    const out = new Float64Array(2);
    let least = Infinity;
    for (let x = -100; x <= 100; x += 0.25) {
      result.design.pieces[0].field.field(x, 0, out);
      least = Math.min(least, Math.hypot(out[0], out[1]));
    }
    expect(least).toBeGreaterThanOrEqual(EQUAL_WEIGHT_STEP * (1 - 1e-9));
    expect(least).toBeLessThan(0.05);
    // the field's own lower bound, largest weight less the others (reverse triangle inequality)
    expect(result.design.pieces[0].field.minModulus).toBeCloseTo(EQUAL_WEIGHT_STEP, 12);
  });
});
