import { describe, expect, it } from 'vitest';
import { parseExportArgs, parseLength } from '@/scripts/zw/export';

describe('zw export arguments', () => {
  it('reads lengths with units into µm', () => {
    expect(parseLength('5nm', '--tolerance')).toBeCloseTo(0.005, 12);
    expect(parseLength('0.005 um', '--tolerance')).toBeCloseTo(0.005, 12);
    expect(parseLength('1µm', '--grid')).toBe(1);
    expect(parseLength('0.46mm', '--x')).toBeCloseTo(460, 9);
  });

  it('refuses lengths without a unit, with the flag named', () => {
    expect(() => parseLength('5', '--tolerance')).toThrow('--tolerance needs a length with a unit, like 5nm or 0.005um; got "5"');
    expect(() => parseLength('0nm', '--grid')).toThrow('--grid must be a positive length');
  });

  it('parses a full command line', () => {
    const parsed = parseExportArgs(['examples/a.zw', '--out', 'b.zip', '--tolerance', '2nm', '--grid=1nm', '--max-vertices', '2000', '--matrix-duty', '0.4,0.5', '--matrix-rows', 'D 90%, D 110%', '--cblock']);
    expect(parsed.script).toBe('examples/a.zw');
    expect(parsed.out).toBe('b.zip');
    expect(parsed.options.designName).toBe('a');
    expect(parsed.options.chordTolerance).toBeCloseTo(0.002, 12);
    expect(parsed.options.databaseUnit).toBeCloseTo(0.001, 12);
    expect(parsed.options.maxVertices).toBe(2000);
    expect(parsed.options.compressOasis).toBe(true);
    expect(parsed.options.matrix).toEqual({ columns: [{ duty: 0.4 }, { duty: 0.5 }], rows: ['D 90%', 'D 110%'] });
  });

  it('says what is wrong with bad flags', () => {
    expect(() => parseExportArgs(['a.zw'])).toThrow('--out <bundle.zip> is required');
    expect(() => parseExportArgs(['--out', 'b.zip'])).toThrow('name the script to export');
    expect(() => parseExportArgs(['a.zw', '--out', 'b.zip', '--speed', 'fast'])).toThrow('unknown option --speed');
    expect(() => parseExportArgs(['a.zw', '--out'])).toThrow('--out needs a value');
    expect(() => parseExportArgs(['a.zw', '--out', 'b.zip', '--max-vertices', '4k'])).toThrow('--max-vertices needs a whole number; got "4k"');
    expect(() => parseExportArgs(['a.zw', '--out', 'b.zip', '--matrix-duty', '0.4,,0.5'])).toThrow('--matrix-duty needs numbers');
  });
});
