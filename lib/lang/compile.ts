import type { CompiledDesign, LabelRequest, Quantization, Region } from '../design/types';
import type { PhaseMap } from '../phasemap/types';
import { assignArguments } from './arguments';
import type { Arg, Expr, Program, Statement } from './ast';
import type { Builtin } from './builtins';
import { findBuiltin } from './builtins';
import type { Diagnostic, Span } from './diagnostic';
import { errorAt, warningAt } from './diagnostic';
import { mathField, mathValue } from './eval/math';
import type { MultiplexLayout } from './eval/multiplex';
import { multiplexRegions } from './eval/multiplex';
import type { Wave } from './eval/phasefield';
import { fociOf, phaseFieldOf } from './eval/phasefield';
import { axiconField, cylindricalLensField, gratingField, lensField, paraxialLensField, phaseMapField } from './eval/profiles';
import { regionBox } from '../design/region-box';
import { shiftRegion } from './eval/regions';
import type { ScalarField, TestField } from './eval/scalar';
import { COORDINATE_FIELDS, angleField, arithmeticField, chooseField, constantField, mergeSymmetry } from './eval/scalar';
import { parse } from './parser';
import { findUnit } from './units';

export interface CompileEnv {
  phaseMaps?: (name: string) => PhaseMap | undefined;
}

/** A value during compilation, in internal units. Constants are folded; fields vary with position. */
type Val =
  | { k: 'num'; v: number }
  | { k: 'bool'; v: boolean }
  | { k: 'text'; v: string }
  | { k: 'tuple'; items: Val[] }
  | { k: 'field'; f: ScalarField }
  | { k: 'test'; t: TestField }
  | { k: 'complex'; waves: Wave[] }
  | { k: 'multiplexed'; layout: MultiplexLayout; parts: Wave[][] }
  | { k: 'region'; region: Region }
  | { k: 'quantization'; q: Quantization }
  | { k: 'label'; label: LabelRequest };

/** Thrown after a diagnostic is recorded, to abandon the statement. */
class Reported extends Error {}

const FLAT_MAP: PhaseMap = { columns: 2, rows: 2, pitchX: 1, pitchY: 1, originX: 0, originY: 0, values: new Float64Array(4) };

/**
 * Compiles a type-checked program to a CompiledDesign. Value errors (a negative focal length,
 * a duty outside 0…1) are reported with their spans; `lenientMaps` stands in a flat map for
 * phase maps not provided, so the checker can run without uploads.
 */
export function compileProgram(
  program: Program,
  env: CompileEnv,
  options: { lenientMaps: boolean },
): { design: CompiledDesign | null; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const bindings = new Map<string, Extract<Statement, { kind: 'bind' }>>();
  const memo = new Map<string, Val | null>();
  const declarations = program.statements.filter((s): s is Extract<Statement, { kind: 'declare' }> => s.kind === 'declare');
  const defaults = new Map<string, Expr>();
  let wavelength: number | null | undefined;

  const fail = (span: Span, message: string, hint?: string): never => {
    diagnostics.push(errorAt(span, message, hint));
    throw new Reported(message);
  };
  const warn = (span: Span, message: string, hint?: string): void => void diagnostics.push(warningAt(span, message, hint));

  function guarded<T>(f: () => T): T | null {
    try {
      return f();
    } catch (error) {
      if (error instanceof Reported) return null;
      throw error;
    }
  }

  function theWavelength(): number {
    if (wavelength === undefined) {
      wavelength = null;
      const decl = declarations.find((d) => d.keyword === 'wavelength');
      if (decl) wavelength = guarded(() => positive(evaluate(decl.value), decl.value.span, 'the wavelength'));
      if (wavelength !== null && (wavelength < 0.1 || wavelength > 20) && decl) {
        warn(decl.value.span, `a wavelength of ${wavelength} µm is outside the usual 0.1–20 µm`, 'check the unit');
      }
    }
    if (wavelength === null) throw new Reported('wavelength');
    return wavelength;
  }

  function binding(name: string): Val {
    if (!memo.has(name)) {
      const s = bindings.get(name)!;
      memo.set(name, null);
      memo.set(name, guarded(() => evaluate(s.value)));
    }
    const v = memo.get(name);
    if (!v) throw new Reported(name);
    return v;
  }

  function asNumber(v: Val, span: Span): number {
    if (v.k !== 'num') return fail(span, 'expected a constant number here');
    return v.v;
  }
  function positive(v: Val, span: Span, what: string): number {
    const n = asNumber(v, span);
    if (!(n > 0)) fail(span, `${what} must be greater than zero`);
    return n;
  }
  function finite(n: number, span: Span): Val {
    if (!Number.isFinite(n)) fail(span, Number.isNaN(n) ? 'this has no value (e.g. sqrt of a negative number)' : 'this value is too large');
    return { k: 'num', v: n };
  }
  function field(v: Val, span: Span): ScalarField {
    if (v.k === 'num') return constantField(v.v);
    if (v.k === 'field') return v.f;
    return fail(span, 'expected a number');
  }
  function waves(v: Val, span: Span): Wave[] {
    if (v.k === 'complex') return v.waves;
    return [{ phase: field(v, span), weight: 1, offset: 0 }];
  }
  function point(v: Val, span: Span): number[] {
    if (v.k !== 'tuple' || v.items.some((i) => i.k !== 'num')) return fail(span, 'expected a constant point');
    return v.items.map((i) => (i as { v: number }).v);
  }
  function test(v: Val): TestField {
    if (v.k === 'bool') {
      const b = v.v;
      return { test: () => b, symmetry: { kind: 'any' } };
    }
    return (v as { t: TestField }).t;
  }

  function arithmetic(e: Extract<Expr, { kind: 'binary' }>, a: Val, b: Val): Val {
    const op = e.op;
    if (op === '/' && b.k === 'num' && b.v === 0) fail(e.right.span, 'division by zero');
    if (a.k === 'num' && b.k === 'num') {
      const v = op === '+' ? a.v + b.v : op === '-' ? a.v - b.v : op === '*' ? a.v * b.v : op === '/' ? a.v / b.v : a.v ** b.v;
      return finite(v, e.span);
    }
    if (op === '^') {
      if (b.k === 'num') return { k: 'field', f: mathField('power', [field(a, e.left.span)], b.v) };
      if (a.k === 'num' && a.v > 0) return { k: 'field', f: mathField('base', [field(b, e.right.span)], a.v) };
      return fail(e.span, 'a varying power needs a positive constant base');
    }
    if (op === '+' || op === '-' || op === '*' || op === '/') {
      const left = a.k === 'num' ? a.v : field(a, e.left.span);
      const right = b.k === 'num' ? b.v : field(b, e.right.span);
      return { k: 'field', f: arithmeticField(op, left, right) };
    }
    return fail(e.span, `unsupported operator ${op}`);
  }

  function comparison(op: string, a: Val, b: Val, span: Span): Val {
    const cmp = (p: number, q: number): boolean =>
      op === '<' ? p < q : op === '<=' ? p <= q : op === '>' ? p > q : op === '>=' ? p >= q : op === '==' ? p === q : p !== q;
    if (a.k === 'num' && b.k === 'num') return { k: 'bool', v: cmp(a.v, b.v) };
    const fa = field(a, span);
    const fb = field(b, span);
    const pa = fa.at;
    const pb = fb.at;
    return { k: 'test', t: { test: (x, y) => cmp(pa(x, y), pb(x, y)), symmetry: mergeSymmetry(fa.symmetry, fb.symmetry) } };
  }

  function logic(op: 'and' | 'or', a: Val, b: Val): Val {
    if (a.k === 'bool' && b.k === 'bool') return { k: 'bool', v: op === 'and' ? a.v && b.v : a.v || b.v };
    const ta = test(a);
    const tb = test(b);
    const p = ta.test;
    const q = tb.test;
    return {
      k: 'test',
      t: { test: op === 'and' ? (x, y) => p(x, y) && q(x, y) : (x, y) => p(x, y) || q(x, y), symmetry: mergeSymmetry(ta.symmetry, tb.symmetry) },
    };
  }

  function evaluate(e: Expr): Val {
    switch (e.kind) {
      case 'number': {
        const factor = e.unit === null ? 1 : findUnit(e.unit)?.factor ?? 1;
        return finite(e.value * factor, e.span);
      }
      case 'text':
        return { k: 'text', v: e.value };
      case 'name':
        if (e.name in COORDINATE_FIELDS) return { k: 'field', f: COORDINATE_FIELDS[e.name as keyof typeof COORDINATE_FIELDS] };
        if (e.name === 'theta') return { k: 'field', f: angleField(0, 0, theWavelength() / (2 * Math.PI)) };
        if (e.name === 'pi') return { k: 'num', v: Math.PI };
        if (e.name === 'wavelength') return { k: 'num', v: theWavelength() };
        return binding(e.name);
      case 'unary': {
        const v = evaluate(e.operand);
        if (e.op === 'not') {
          if (v.k === 'bool') return { k: 'bool', v: !v.v };
          const t = test(v).test;
          return { k: 'test', t: { test: (x, y) => !t(x, y), symmetry: test(v).symmetry } };
        }
        return v.k === 'num' ? { k: 'num', v: -v.v } : { k: 'field', f: arithmeticField('-', 0, field(v, e.span)) };
      }
      case 'binary': {
        const a = evaluate(e.left);
        const b = evaluate(e.right);
        if (e.op === 'and' || e.op === 'or') return logic(e.op, a, b);
        if (['<', '<=', '>', '>=', '==', '!='].includes(e.op)) return comparison(e.op, a, b, e.span);
        return arithmetic(e, a, b);
      }
      case 'if': {
        const c = evaluate(e.condition);
        if (c.k === 'bool') return evaluate(c.v ? e.then : e.otherwise);
        const a = evaluate(e.then);
        const b = evaluate(e.otherwise);
        return { k: 'field', f: chooseField(test(c), field(a, e.then.span), field(b, e.otherwise.span)) };
      }
      case 'tuple':
        return { k: 'tuple', items: e.items.map(evaluate) };
      case 'call':
        return call(e);
      case 'invalid':
        return fail(e.span, 'invalid expression');
    }
  }

  function call(e: Extract<Expr, { kind: 'call' }>): Val {
    const b = findBuiltin(e.callee)!;
    if (b.category === 'math') {
      const args = e.args.map((a) => evaluate(a.value));
      if (b.name === 'mod' && args[1].k === 'num' && args[1].v === 0) fail(e.args[1].value.span, 'mod by zero');
      if (args.every((a) => a.k === 'num')) return finite(mathValue(b.name, args.map((a) => (a as { v: number }).v)), e.span);
      return { k: 'field', f: mathField(b.name, args.map((a, i) => field(a, e.args[i].value.span))) };
    }
    return BUILDERS[b.name](new Call(b, e));
  }

  class Call {
    private readonly given: Map<string, Arg>;
    readonly rest: Arg[];
    constructor(
      readonly builtin: Builtin,
      readonly expr: Extract<Expr, { kind: 'call' }>,
    ) {
      const assigned = assignArguments(builtin, expr.args);
      this.given = assigned.given;
      this.rest = assigned.rest;
    }
    has(name: string): boolean {
      return this.given.has(name);
    }
    span(name: string): Span {
      return this.given.get(name)?.value.span ?? this.expr.span;
    }
    private source(name: string): Expr {
      const a = this.given.get(name);
      if (a) return a.value;
      const param = this.builtin.params.find((p) => p.name === name)!;
      const key = `${this.builtin.name}.${name}`;
      if (!defaults.has(key)) {
        const parsed = parse(`d = ${param.default}`).program.statements[0];
        defaults.set(key, (parsed as { value: Expr }).value);
      }
      return defaults.get(key)!;
    }
    value(name: string): Val {
      return evaluate(this.source(name));
    }
    num(name: string): number {
      return asNumber(this.value(name), this.span(name));
    }
    positive(name: string, what = name): number {
      return positive(this.value(name), this.span(name), what);
    }
    count(name: string, least: number): number {
      const n = this.num(name);
      if (!Number.isInteger(n)) fail(this.span(name), `${name} must be a whole number`);
      if (n < least) fail(this.span(name), `${name} must be at least ${least}`);
      return n;
    }
    point(name: string): number[] {
      return point(this.value(name), this.span(name));
    }
    word(name: string): string {
      const s = this.source(name);
      return s.kind === 'name' ? s.name : '';
    }
    region(name: string): Region {
      return (this.value(name) as { region: Region }).region;
    }
    text(name: string): string {
      return (this.value(name) as { v: string }).v;
    }
    lambda(): number {
      return theWavelength();
    }
    fail(name: string, message: string, hint?: string): never {
      return fail(this.span(name), message, hint);
    }
  }

  const phase = (f: ScalarField): Val => ({ k: 'field', f });
  /** Angle in the open interval (0, 90°), for deflections. */
  const deflection = (c: Call, name: string): number => {
    const a = c.num(name);
    if (!(a > 0 && a < Math.PI / 2)) c.fail(name, `${name} must lie between 0 and 90 deg`);
    return a;
  };
  const regionOf = (region: Region): Val => ({ k: 'region', region });
  const regionParts = (c: Call): Region[] => c.rest.map((a) => (evaluate(a.value) as { region: Region }).region);
  const multiplexParts = (c: Call): Wave[][] => c.rest.map((a) => waves(evaluate(a.value), a.value.span));
  const fraction = (c: Call, name: string, lo: number, hi: number, what: string): number => {
    const v = c.num(name);
    if (!(v > lo && v < hi)) c.fail(name, `${name} must lie between ${lo} and ${hi} (${what})`);
    return v;
  };

  const BUILDERS: Record<string, (c: Call) => Val> = {
    lens: (c) => {
      const [x, y] = c.point('centre');
      return phase(lensField(c.lambda(), c.positive('focal', 'the focal length'), x, y));
    },
    lens_to: (c) => {
      const [x, y, z] = c.point('focus');
      if (!(z > 0)) c.fail('focus', 'the focal point must lie behind the mask (z > 0)');
      return phase(lensField(c.lambda(), z, x, y));
    },
    paraxial_lens: (c) => {
      const [x, y] = c.point('centre');
      return phase(paraxialLensField(c.lambda(), c.positive('focal', 'the focal length'), x, y));
    },
    cylindrical_lens: (c) => {
      const [x, y] = c.point('centre');
      return phase(cylindricalLensField(c.lambda(), c.positive('focal', 'the focal length'), c.num('axis'), x, y));
    },
    grating: (c) => {
      const period = c.has('period') ? c.positive('period', 'the period') : c.lambda() / Math.sin(deflection(c, 'angle'));
      return phase(gratingField(period, c.num('direction')));
    },
    vortex: (c) => {
      const [x, y] = c.point('centre');
      const m = c.num('charge');
      if (!Number.isInteger(m) || m === 0) c.fail('charge', 'the charge must be a whole number other than 0');
      return phase(angleField(x, y, c.lambda() / (2 * Math.PI), m));
    },
    axicon: (c) => {
      const [x, y] = c.point('centre');
      const period = c.has('period') ? c.positive('period', 'the period') : c.lambda() / Math.sin(deflection(c, 'angle'));
      return phase(axiconField(period, x, y));
    },
    phase_map: (c) => {
      const name = c.text('name');
      const map = env.phaseMaps?.(name) ?? (options.lenientMaps ? FLAT_MAP : undefined);
      if (!map) return c.fail("name", `no phase map named "${name}"`, "upload the map with the design first");
      return phase(phaseMapField(map, c.num('scale')));
    },
    wave: (c) => {
      const weight = c.num('weight');
      if (!(weight >= 0)) c.fail('weight', 'a weight must be zero or more', 'for a sign change use offset: 0.5 waves');
      return { k: 'complex', waves: [{ phase: field(c.value('phase'), c.span('phase')), weight, offset: c.num('offset') }] };
    },
    superpose: (c) => {
      const parts = c.rest.flatMap((a) => waves(evaluate(a.value), a.value.span));
      if (!parts.some((w) => w.weight > 0)) fail(c.expr.span, 'at least one part needs a weight above zero');
      return { k: 'complex', waves: parts };
    },
    stripes: (c) => ({ k: 'multiplexed', layout: { kind: 'stripes', period: c.positive('period', 'the stripe period'), direction: c.num('direction') }, parts: multiplexParts(c) }),
    sectors: (c) => {
      const [cx, cy] = c.point('centre');
      const parts = multiplexParts(c);
      const count = c.count('count', parts.length);
      if (count % parts.length !== 0) warn(c.span('count'), `${count} sectors do not share out evenly among ${parts.length} parts`);
      return { k: 'multiplexed', layout: { kind: 'sectors', count, cx, cy }, parts };
    },
    circle: (c) => {
      const [cx, cy] = c.point('centre');
      const r = c.has('radius') ? c.positive('radius', 'the radius') : c.positive('diameter', 'the diameter') / 2;
      return regionOf({ kind: 'circle', cx, cy, r });
    },
    ring: (c) => {
      const [cx, cy] = c.point('centre');
      const rInner = c.num('inner');
      const rOuter = c.positive('outer', 'the outer radius');
      if (!(rInner >= 0 && rInner < rOuter)) c.fail('inner', 'the inner radius must be at least 0 and less than the outer radius');
      return regionOf({ kind: 'ring', cx, cy, rInner, rOuter });
    },
    rectangle: (c) => {
      const [cx, cy] = c.point('centre');
      const w = c.positive('width', 'the width') / 2;
      const h = c.positive('height', 'the height') / 2;
      return regionOf({ kind: 'rectangle', x0: cx - w, y0: cy - h, x1: cx + w, y1: cy + h });
    },
    polygon: (c) => {
      const points = Float64Array.from(c.rest.flatMap((a) => point(evaluate(a.value), a.value.span)));
      let area = 0;
      for (let i = 0, j = points.length - 2; i < points.length; j = i, i += 2) area += points[j] * points[i + 1] - points[i] * points[j + 1];
      if (Math.abs(area) < 1e-12) fail(c.expr.span, 'the polygon has no area');
      return regionOf({ kind: 'polygon', points });
    },
    union: (c) => regionOf({ kind: 'union', parts: regionParts(c) }),
    intersection: (c) => regionOf({ kind: 'intersection', parts: regionParts(c) }),
    difference: (c) => regionOf({ kind: 'difference', parts: regionParts(c) }),
    shift: (c) => {
      const [dx, dy] = c.point('by');
      return regionOf(shiftRegion(c.region('region'), dx, dy));
    },
    binary: (c) => ({
      k: 'quantization',
      q: {
        kind: 'binary',
        duty: fraction(c, 'duty', 0, 1, 'the fraction of each period in state 1'),
        phaseOffset: c.num('offset'),
        modulation: c.word('modulation') === 'phase' ? 'phase' : 'amplitude',
        tone: c.word('tone') === 'negative' ? 'negative' : 'positive',
        refractiveIndex: fraction(c, 'index', 1, 5, 'a refractive index'),
      },
    }),
    multilevel: (c) => {
      const levels = c.count('levels', 2);
      const bits = Math.log2(levels);
      if (!Number.isInteger(bits) || bits > 8) c.fail('levels', 'levels must be a power of two from 2 to 256', 'e.g. levels: 4 (2 masks) or 8 (3 masks)');
      return { k: 'quantization', q: { kind: 'multilevel', bits, phaseOffset: c.num('offset'), refractiveIndex: fraction(c, 'index', 1, 5, 'a refractive index') } };
    },
    text: (c) => {
      const text = c.text('content');
      if (!/^[\x20-\x7e]{1,200}$/.test(text)) c.fail('content', 'a label needs 1 to 200 plain characters (letters, digits, punctuation, spaces)');
      const [x, y] = c.point('at');
      return { k: 'label', label: { text, x, y, height: c.positive('height', 'the letter height') } };
    },
  };

  for (const s of program.statements) if (s.kind === 'bind') bindings.set(s.name, s);
  for (const s of program.statements) if (s.kind === 'bind') guarded(() => binding(s.name));

  const results = new Map<string, Val[]>();
  for (const d of declarations) {
    const v = d.keyword === 'wavelength' ? guarded(() => ({ k: 'num', v: theWavelength() }) as Val) : guarded(() => evaluate(d.value));
    if (v) results.set(d.keyword, [...(results.get(d.keyword) ?? []), v]);
  }
  const one = <K extends Val['k']>(keyword: string, k: K): Extract<Val, { k: K }> | undefined => {
    const v = results.get(keyword)?.[0];
    return v && v.k === k ? (v as Extract<Val, { k: K }>) : undefined;
  };
  const lambda = one('wavelength', 'num');
  const aperture = one('aperture', 'region');
  const quantization = one('quantize', 'quantization');
  const profile = results.get('profile')?.[0];
  const profileDecl = declarations.find((d) => d.keyword === 'profile');
  if (!lambda || !aperture || !quantization || !profile || !profileDecl) return { design: null, diagnostics };

  const design = guarded((): CompiledDesign => {
    const labels = (results.get('label') ?? []).map((v) => (v as { label: LabelRequest }).label);
    if (profile.k === 'multiplexed') {
      const regions = multiplexRegions(profile.layout, profile.parts.length, aperture.region, regionBox(aperture.region));
      if (typeof regions === 'string') return fail(profileDecl.value.span, regions);
      return {
        wavelength: lambda.v,
        aperture: aperture.region,
        pieces: profile.parts.map((w, i) => ({ region: regions[i], field: phaseFieldOf(w) })),
        quantization: quantization.q,
        foci: profile.parts.flatMap(fociOf),
        symmetryCentre: null,
        labels,
      };
    }
    const parts = waves(profile, profileDecl.value.span);
    return {
      wavelength: lambda.v,
      aperture: aperture.region,
      pieces: [{ region: null, field: phaseFieldOf(parts) }],
      quantization: quantization.q,
      foci: fociOf(parts),
      symmetryCentre: symmetryCentre(aperture.region, parts),
      spiral: spiralAbout(aperture.region, parts),
      labels,
    };
  });
  return { design, diagnostics };
}

/** The centre when the aperture is a disc or ring and every part of the profile is symmetric about it. */
/** The spiral of a single-wave profile whose aperture is a disc or ring about its centre. */
function spiralAbout(aperture: Region, parts: Wave[]): CompiledDesign['spiral'] {
  const spiral = parts.length === 1 ? parts[0].phase.spiral : undefined;
  if (!spiral || (aperture.kind !== 'circle' && aperture.kind !== 'ring')) return null;
  return aperture.cx === spiral.x && aperture.cy === spiral.y ? { ...spiral } : null;
}

function symmetryCentre(aperture: Region, parts: Wave[]): { x: number; y: number } | null {
  if (aperture.kind !== 'circle' && aperture.kind !== 'ring') return null;
  const centre = { kind: 'about' as const, x: aperture.cx, y: aperture.cy };
  const merged = parts.reduce((s, w) => mergeSymmetry(s, w.phase.symmetry), mergeSymmetry(centre, { kind: 'any' }));
  return merged.kind === 'about' ? { x: merged.x, y: merged.y } : null;
}
