import { describe, expect, it } from 'vitest';
import { BUILTINS, DECLARATIONS, checkScript } from '@/lib/lang';
import { completionsAt, hoverAt, signatureOf } from '@/lib/lang/assist';
import { analyzeScript } from '@/lib/lang';

const PRELUDE = 'wavelength 405 nm\naperture circle(diameter: 460 um)\nquantize binary(duty: 0.5)\nprofile lens(focal: 1 mm)\n';

describe('the built-in table', () => {
  it.each(BUILTINS.map((b) => [b.name, b] as const))('%s: its example checks clean', (_name, b) => {
    const line = b.example.startsWith('profile ') || b.example.startsWith('aperture ') || b.example.startsWith('quantize ') ? b.example.replace(/^(\w+) /, 'use_$1 = ') : b.example;
    const source = PRELUDE + line + '\n';
    const errors = checkScript(source).filter((d) => d.severity === 'error');
    expect(errors).toEqual([]);
  });

  it('has a description and a unit-bearing signature for every entry', () => {
    for (const b of BUILTINS) {
      expect(b.description.length).toBeGreaterThan(3);
      expect(signatureOf(b)).toContain(b.name);
    }
    expect(signatureOf(BUILTINS.find((b) => b.name === 'lens')!)).toBe('lens(focal: length [nm, um, mm, m], centre: point [(x, y) in nm, um, mm] = (0 um, 0 um)) → phase field');
  });

  it('declares each required statement once', () => {
    expect(DECLARATIONS.filter((d) => d.required).map((d) => d.keyword)).toEqual(['wavelength', 'aperture', 'profile', 'quantize']);
  });
});

describe('editor assistance', () => {
  it('offers the parameters of the enclosing call first, with units', () => {
    const source = 'wavelength 405 nm\nprofile lens(';
    const items = completionsAt(source, 2, 14);
    expect(items[0]).toMatchObject({ label: 'focal:', detail: 'focal: length [nm, um, mm, m]' });
    expect(items.some((i) => i.label === 'superpose' && i.kind === 'function')).toBe(true);
    expect(items.some((i) => i.label === 'mm' && i.kind === 'unit')).toBe(true);
    const options = completionsAt('quantize binary(tone: ', 1, 23).filter((i) => i.kind === 'option').map((i) => i.label);
    expect(options).toEqual(['amplitude', 'phase', 'positive', 'negative']);
  });

  it('offers bindings defined above the cursor', () => {
    const items = completionsAt('near = lens(focal: 1 mm)\nprofile ', 2, 9);
    expect(items.find((i) => i.label === 'near')).toMatchObject({ kind: 'variable' });
  });

  it('hovers with the type and unit of the expression under the cursor', () => {
    const source = 'wavelength 405 nm\nk = 2 * pi / wavelength\nd = 3 um * 2 um\nprofile k * x\n';
    const { types } = analyzeScript(source);
    expect(hoverAt(source, types, 2, 1)).toBeNull();
    expect(hoverAt(source, types, 2, 5)?.contents[0]).toBe('type: **dimensionless**');
    expect(hoverAt(source, types, 2, 13)?.contents[0]).toBe('type: **inverse length (µm⁻¹)**');
    expect(hoverAt(source, types, 3, 10)?.contents[0]).toBe('type: **area (µm²)**');
    expect(hoverAt(source, types, 4, 11)?.contents[0]).toBe('type: **phase field (plain number, read as rad)**');
    expect(hoverAt(source, types, 3, 7)?.contents[0]).toMatch(/unit \*\*um\*\*: micrometre/);
    expect(hoverAt('profile lens(focal: 1 mm)', [], 1, 10)?.contents[0]).toContain('lens(focal: length');
  });
});
