import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Arg, Expr, Program, Statement } from '@/lib/lang/ast';
import { checkScript, compileScript, parse, printProgram } from '@/lib/lang';

const zero = { line: 0, column: 0 };
const span = { start: zero, end: zero };

const names = fc.constantFrom('a', 'b2', 'focal_len', 'x', 'y', 'r', 'theta', 'pi', 'wavelength', 'µm_ish');
const units = fc.constantFrom(null, 'nm', 'um', 'µm', 'mm', 'm', 'rad', 'mrad', 'deg', 'waves');
const binaryOps = fc.constantFrom('+', '-', '*', '/', '^', '<', '<=', '>', '>=', '==', '!=', 'and', 'or');

const { expr } = fc.letrec<{ expr: Expr; leaf: Expr }>((tie) => ({
  leaf: fc.oneof(
    fc.record({ value: fc.double({ min: 0, max: 1e9, noNaN: true, noDefaultInfinity: true }), unit: units }).map(({ value, unit }) => ({ kind: 'number', value, unit, span, unitSpan: null }) as Expr),
    fc.string({ maxLength: 8 }).filter((s) => !/[\n\r]/.test(s)).map((value) => ({ kind: 'text', value, span }) as Expr),
    names.map((name) => ({ kind: 'name', name, span }) as Expr),
  ),
  expr: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    tie('leaf'),
    fc.record({ op: fc.constantFrom('-', 'not'), operand: tie('expr') }).map((u) => ({ kind: 'unary', ...u, span }) as Expr),
    fc.record({ op: binaryOps, left: tie('expr'), right: tie('expr') }).map((b) => ({ kind: 'binary', ...b, span }) as Expr),
    fc.record({ condition: tie('expr'), then: tie('expr'), otherwise: tie('expr') }).map((i) => ({ kind: 'if', ...i, span }) as Expr),
    fc.array(tie('expr'), { minLength: 2, maxLength: 3 }).map((items) => ({ kind: 'tuple', items, span }) as Expr),
    fc
      .record({
        callee: fc.constantFrom('lens', 'circle', 'sin', 'superpose', 'my_fn'),
        args: fc.array(fc.record({ name: fc.option(fc.constantFrom('focal', 'centre', 'weight'), { nil: null }), value: tie('expr') }), { maxLength: 3 }),
      })
      .map(({ callee, args }) => ({ kind: 'call', callee, calleeSpan: span, args: args.map((a) => ({ ...a, nameSpan: null }) as Arg), span }) as Expr),
  ),
}));

const statement: fc.Arbitrary<Statement> = fc.oneof(
  fc.record({ name: fc.constantFrom('near', 'far', 'k', 'tilt_2'), value: expr }).map((b) => ({ kind: 'bind', ...b, nameSpan: span, span }) as Statement),
  fc.record({ keyword: fc.constantFrom('wavelength', 'aperture', 'profile', 'quantize', 'label'), value: expr }).map((d) => ({ kind: 'declare', ...d, keywordSpan: span, span }) as Statement),
);

/** The tree without source positions, for comparing what was parsed. */
function shape(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(shape);
  if (value && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value).filter(([k]) => !/span$/i.test(k)).map(([k, v]) => [k, shape(v)]));
  }
  return value;
}

describe('pretty-printing then parsing', () => {
  it('gives back the same tree for any valid program', () => {
    fc.assert(
      fc.property(fc.array(statement, { minLength: 1, maxLength: 4 }), (statements) => {
        const program: Program = { statements, brokenDeclarations: [] };
        const text = printProgram(program);
        const reparsed = parse(text);
        expect(reparsed.diagnostics).toEqual([]);
        expect(shape(reparsed.program)).toEqual(shape(program));
      }),
      { numRuns: 400 },
    );
  });
});

describe('the checker and compiler never throw', () => {
  const pieces = fc.constantFrom(
    'wavelength', 'aperture', 'profile', 'quantize', 'label', 'lens', '(', ')', ',', ':', '=', '+', '-', '*', '/', '^', '<', '==',
    'if', 'then', 'else', 'and', 'not', '1', '0.5', '1e3', 'nm', 'um', 'mm', 'deg', 'waves', 'x', 'r', 'theta', 'pi', '"txt"', '"',
    'circle', 'superpose', 'wave', 'stripes', 'sectors', 'binary', 'multilevel', 'focal:', 'centre:', 'radius:', '\n', '#', ' ', 'µ', '\t',
  );
  it('on arbitrary text', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 200 }), (text) => {
        expect(Array.isArray(checkScript(text))).toBe(true);
        expect(typeof compileScript(text).ok).toBe('boolean');
      }),
      { numRuns: 500 },
    );
  });
  it('on token soup close to the language', () => {
    fc.assert(
      fc.property(fc.array(pieces, { maxLength: 60 }), (tokens) => {
        const text = tokens.join(' ');
        const diagnostics = checkScript(text);
        for (const d of diagnostics) {
          expect(d.start.line).toBeGreaterThanOrEqual(1);
          expect(d.start.column).toBeGreaterThanOrEqual(1);
          expect(d.message.length).toBeGreaterThan(0);
        }
        compileScript(text);
      }),
      { numRuns: 500 },
    );
  });
  it('on mutations of a valid script', () => {
    const base = 'wavelength 405 nm\naperture circle(diameter: 460 um)\nnear = lens(focal: 800 um, centre: (-40 um, 0 um))\nprofile superpose(wave(near, weight: 0.6), lens(focal: 1 mm))\nquantize binary(duty: 0.5)\n';
    fc.assert(
      fc.property(fc.nat(base.length), fc.nat(6), fc.string({ maxLength: 4 }), (at, cut, insert) => {
        const text = base.slice(0, at) + insert + base.slice(at + cut);
        checkScript(text);
        compileScript(text);
      }),
      { numRuns: 500 },
    );
  });
  it('on very deep nesting and very long input', () => {
    expect(checkScript('profile ' + '('.repeat(5000) + '1' + ')'.repeat(5000)).length).toBeGreaterThan(0);
    expect(checkScript('k = ' + Array(20000).fill('1').join(' + ')).length).toBeGreaterThanOrEqual(0);
    expect(checkScript('x'.repeat(300_000))[0].message).toMatch(/at most/);
  });
});
