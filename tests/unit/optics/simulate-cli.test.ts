import { describe, expect, it } from 'vitest';
import { simulateMask } from '@/lib/optics';
import { formatTable, parseSimulateArgs } from '@/scripts/zw/simulate';
import { binaryAmplitude, binaryRings, lensDesign, ringLibrary } from './fixtures';

describe('zw simulate arguments', () => {
  it('reads the script, --json and the options with units', () => {
    const parsed = parseSimulateArgs(['a.zw', '--json', '--point-source', '40mm', '--band', '420nm,680nm', '--method', 'fft-2d', '--grid', '1024']);
    expect(parsed).toEqual({
      script: 'a.zw',
      json: true,
      options: { illumination: { kind: 'point', distance_um: 40000 }, band: { from_um: 0.42, to_um: 0.68 }, method: 'fft-2d', maxGrid: 1024 },
    });
  });

  it('says what is wrong with bad arguments', () => {
    expect(() => parseSimulateArgs([])).toThrow(/exactly one script/);
    expect(() => parseSimulateArgs(['a.zw', '--grid', '1000'])).toThrow(/power of two/);
    expect(() => parseSimulateArgs(['a.zw', '--band', '680nm,420nm'])).toThrow(/shorter to the longer/);
    expect(() => parseSimulateArgs(['a.zw', '--method', 'magic'])).toThrow(/radial or fft-2d/);
    expect(() => parseSimulateArgs(['a.zw', '--point-source'])).toThrow(/needs a value/);
    expect(() => parseSimulateArgs(['a.zw', '--frobnicate'])).toThrow(/unknown option/);
  });
});

describe('zw simulate table', () => {
  it('lists foci, orders with units, the chromatic shift and the caution', () => {
    const result = simulateMask(lensDesign({ wavelength: 0.5, focal: 500, radius: 60, quantization: binaryAmplitude }), ringLibrary([binaryRings(0.5, 500, 60)], 'zones'), {
      band: { from_um: 0.49, to_um: 0.51, samples: 3 },
    });
    const table = formatTable('lens.zw', result);
    expect(table).toContain('lens.zw: amplitude mask, λ 500.0 nm, plane wave');
    expect(table).toMatch(/foci \(µm\)/);
    expect(table).toMatch(/\+3 .* %/);
    expect(table).toContain('IEC 60825-1');
    expect(table.split('\n').filter((l) => /^\s+\d{3}\.\d\s/.test(l))).toHaveLength(3);
  });
});
