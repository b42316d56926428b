import { describe, expect, it } from 'vitest';
import { toCsv } from '@/components/focus-check/csv';
import { axialCsv, chromaticCsv, focalMapCsv } from '@/components/focus-check/curves';

describe('CSV of the focus-check curves', () => {
  it('quotes fields the way RFC 4180 says and ends records with CRLF', () => {
    // RFC 4180 §2: fields with commas, quotes or line breaks are enclosed in quotes, quotes doubled
    expect(toCsv(['a', 'b'], [['x,y', 'say "hi"'], [1.5, null]])).toBe('a,b\r\n"x,y","say ""hi"""\r\n1.5,\r\n');
  });

  it('writes one row per sample with units in the header', () => {
    const axial = axialCsv({ focusIndex: 0, x_um: 0, y_um: 0, z_um: [10, 20], intensity: [0.5, 2] });
    expect(axial.split('\r\n')).toEqual(['z_um,intensity_relative_to_incident', '10,0.5', '20,2', '']);
    const chromatic = chromaticCsv({ focusIndex: 0, wavelength_um: [0.4, 0.5], focus_z_um: [1250, 1000], expected_z_um: [1250, 1000], zones: 10, maxBandwidth_um: 0.05, note: '' });
    expect(chromatic.split('\r\n')[2]).toBe('0.5,1000,1000');
    const map = focalMapCsv({ focusIndex: 0, z_um: 1000, centre_um: [5, -5], step_um: 0.5, size: 3, intensity: [0, 1, 2, 3, 4, 5, 6, 7, 8] });
    const lines = map.split('\r\n');
    expect(lines).toHaveLength(11);
    expect(lines[1]).toBe('4.5,-5.5,0');
    expect(lines[9]).toBe('5.5,-4.5,8');
  });
});
