import { describe, expect, it } from 'vitest';
import { checkScript } from '@/lib/lang';

const HEAD = 'wavelength 405 nm\naperture circle(diameter: 460 um)\nquantize binary(duty: 0.5)\n';

/** Errors on line 4 of a script whose first three lines are valid declarations. */
function errorsOf(line: string): { message: string; hint?: string; from: number; to: number; line: number }[] {
  return checkScript(HEAD + line + '\n')
    .filter((d) => d.severity === 'error')
    .map((d) => ({ message: d.message, hint: d.hint, from: d.start.column, to: d.end.column, line: d.start.line }));
}

// Each case: the line, the expected message pattern, and the exact columns [from, to) of the span.
const CASES: [string, RegExp, number, number][] = [
  ['profile lens(focal: 1 mm) + 20 um', /cannot add length \(µm\) to phase field/, 9, 34],
  ['profile lens(focal: 1 mm) + 2 deg * 3 um', /cannot add/, 9, 41],
  ['profile lens(focal: 2)', /focal of lens must be a length, not dimensionless/, 21, 22],
  ['profile lens(focal: 30 deg)', /focal of lens must be a length, not angle or phase/, 21, 27],
  ['profile lens(focal: 1 mm, centre: (0 um, 0 deg))', /centre of lens must be a point/, 35, 48],
  ['profile grating(period: 10 um, direction: 0.3)', /direction of grating must be an angle/, 43, 46],
  ['profile wave(lens(focal: 1 mm), offset: 3 um)', /offset of wave must be a phase/, 41, 45],
  ['profile lens(focal: 1 mmm)', /unknown unit "mmm"/, 23, 26],
  ['profile lenz(focal: 1 mm)', /unknown function "lenz"/, 9, 13],
  ['profile lens(focal: 1 mm, center: (0 um, 0 um))', /lens has no parameter "center"/, 27, 33],
  ['profile lens(focal: 1 mm) * focl', /unknown name "focl"/, 29, 33],
  ['profile lens()', /lens needs focal: a length/, 9, 15],
  ['profile grating()', /grating needs one of period or angle/, 9, 18],
  ['profile grating(period: 3 um, angle: 1 deg)', /only one of period or angle/, 9, 44],
  ['profile sin(x)', /sin needs an angle, not position-dependent length/, 13, 14],
  ['profile lens(focal: x)', /must be a constant/, 21, 22],
  ['profile 3 um', /profile must be a phase field, complex field or multiplexed profile, not length/, 9, 13],
  ['profile superpose(lens(focal: 1 mm))', /needs at least 2 parts/, 9, 37],
  ['profile wave(lens(focal: 1 mm)) + 1', /complex field cannot take part in arithmetic/, 9, 32],
  ['profile if x < 2 then 1 else 0', /cannot compare position-dependent length \(µm\) with dimensionless/, 12, 17],
  ['profile lens(focal: 1 mm', /this "\(" is never closed/, 13, 14],
  ['profile lens(focal: 1 mm) +', /expected a value, found the end of the line/, 28, 29],
  ['profile lens(focal 1 mm)', /expected "\)" to close the arguments of lens\(, found "1"/, 20, 21],
  ['profile r ^ 0.5', /to the power 0.5 has no unit/, 13, 16],
  ['profile 2 x', /"x" is not a unit/, 11, 12],
  ['profile "lens"', /profile must be a phase field.*not text/, 9, 15],
  ['profile lens(focal: 1 mm) $', /unexpected character "\$"/, 27, 28],
];

describe('type and unit errors', () => {
  it.each(CASES)('%s', (line, message, from, to) => {
    const errors = errorsOf(line);
    const hit = errors.find((e) => message.test(e.message));
    expect(hit, `got: ${JSON.stringify(errors)}`).toBeDefined();
    expect(hit).toMatchObject({ line: 4, from, to });
  });

  it('suggests the intended unit and name', () => {
    expect(errorsOf('profile lens(focal: 1 mmm)')[0].hint).toBe('did you mean mm?');
    expect(errorsOf('profile lens(focal: 1 mm, center: (0 um, 0 um))')[0].hint).toBe('did you mean centre?');
    expect(checkScript('wavelength 405 nm\nk = 2 * pi / wavelen\n').find((d) => /wavelen/.test(d.message))?.hint).toBe('did you mean wavelength?');
  });

  it('reports several errors in one pass, one per broken line', () => {
    const diagnostics = checkScript('wavelength 405 nmm\naperture circle(radius: 3)\nprofile lens(focal: 1 mm) + 2 um\nquantize binary(duty: 0.5\n');
    expect(diagnostics.map((d) => d.start.line)).toEqual([1, 2, 3, 4]);
  });

  it('reports missing and repeated declarations', () => {
    const missing = checkScript('profile lens(focal: 1 mm)\n').map((d) => d.message);
    expect(missing).toEqual(expect.arrayContaining([expect.stringMatching(/missing wavelength/), expect.stringMatching(/missing aperture/), expect.stringMatching(/missing quantize/)]));
    const twice = checkScript(HEAD + 'profile lens(focal: 1 mm)\nwavelength 500 nm\n');
    expect(twice.find((d) => /declared twice/.test(d.message))).toMatchObject({ start: { line: 5, column: 1 }, end: { line: 5, column: 11 } });
  });

  it('rejects names used before their definition, redefined or shadowing built-ins', () => {
    const early = checkScript(HEAD + 'profile near\nnear = lens(focal: 1 mm)\n');
    expect(early.find((d) => /used before it is defined/.test(d.message))?.hint).toMatch(/line 5/);
    expect(errorsOf('lens = 3').map((e) => e.message)).toContain('lens is a built-in name and cannot be redefined');
    expect(checkScript(HEAD + 'a = 1\na = 2\nprofile a\n').some((d) => /already defined/.test(d.message))).toBe(true);
  });

  it('checks constant values: focal length, duty, levels, charge', () => {
    const bad = (line: string): string[] => checkScript('wavelength 405 nm\naperture circle(diameter: 460 um)\n' + line).filter((d) => d.severity === 'error').map((d) => d.message);
    expect(bad('profile lens(focal: -1 mm)\nquantize binary()\n')).toEqual(['the focal length must be greater than zero']);
    expect(bad('profile lens(focal: 1 mm)\nquantize binary(duty: 1.2)\n')[0]).toMatch(/duty must lie between 0 and 1/);
    expect(bad('profile lens(focal: 1 mm)\nquantize multilevel(levels: 6)\n')[0]).toMatch(/power of two/);
    expect(bad('profile vortex(charge: 1.5)\nquantize binary()\n')[0]).toMatch(/whole number/);
    expect(bad('profile x / (0 um)\nquantize binary()\n')).toEqual(['division by zero']);
    expect(bad('profile mod(x, 0 um) / 1 um\nquantize binary()\n')).toEqual(['mod by zero']);
  });

  it('warns about unused bindings without failing', () => {
    const d = checkScript(HEAD + 'spare = 3 um\nprofile lens(focal: 1 mm)\n');
    expect(d).toEqual([expect.objectContaining({ severity: 'warning', message: 'spare is defined but never used', start: { line: 4, column: 1 }, end: { line: 4, column: 6 } })]);
  });
});
