import type { Expr, Program, Statement } from './ast';
import { assignArguments } from './arguments';
import type { Builtin, ParamType } from './builtins';
import { BUILTINS, DECLARATIONS, findBuiltin } from './builtins';
import type { Diagnostic, Span } from './diagnostic';
import { errorAt, warningAt } from './diagnostic';
import { closest } from './suggest';
import type { Ty } from './types';
import { DIMENSIONLESS, ERROR, LENGTH, formatType, num, sameDimension, sameType } from './types';
import { UNITS, findUnit } from './units';

/** The type of one expression, for hovers. */
export interface TypeNote {
  span: Span;
  type: string;
}

export interface CheckResult {
  diagnostics: Diagnostic[];
  types: TypeNote[];
}

interface Binding {
  ty: Ty;
  span: Span;
  used: boolean;
  usesWavelength: boolean;
}

const COORDINATES: Record<string, Ty> = {
  x: num(1, 0, true),
  y: num(1, 0, true),
  r: num(1, 0, true),
  theta: num(0, 1, true),
};

const RESERVED = new Set(BUILTINS.map((b) => b.name));
const WORDS = new Set(BUILTINS.flatMap((b) => b.params.flatMap((p) => p.options ?? [])));

function returnType(b: Builtin): Ty {
  switch (b.returns) {
    case 'phase field':
      return num(0, 1, true);
    case 'complex field':
      return { k: 'complex' };
    case 'multiplexed':
      return { k: 'multiplexed' };
    case 'region':
      return { k: 'region' };
    case 'quantization':
      return { k: 'quantization' };
    case 'label':
      return { k: 'label' };
    case 'length':
      return b.category === 'coordinate' ? num(1, 0, true) : LENGTH;
    case 'angle':
      return num(0, 1, b.category === 'coordinate');
    default:
      return DIMENSIONLESS;
  }
}

const DECLARED_KIND: Record<string, Ty['k']> = { aperture: 'region', quantize: 'quantization', label: 'label' };

/** Type-checks a parsed program; never throws. */
export function checkProgram(program: Program): CheckResult {
  const diagnostics: Diagnostic[] = [];
  const types: TypeNote[] = [];
  const scope = new Map<string, Binding>();
  const laterNames = new Map<string, number>();
  const declared = new Set<string>(program.statements.filter((s) => s.kind === 'declare').map((s) => (s as { keyword: string }).keyword));
  let usesWavelength = false;
  let inWavelength = false;

  const error = (span: Span, message: string, hint?: string): Ty => {
    diagnostics.push(errorAt(span, message, hint));
    return ERROR;
  };
  const note = (span: Span, ty: Ty): Ty => {
    if (ty.k !== 'error') types.push({ span, type: formatType(ty) });
    return ty;
  };

  function nameType(e: Extract<Expr, { kind: 'name' }>): Ty {
    const { name, span } = e;
    if (name in COORDINATES) return COORDINATES[name];
    if (name === 'pi') return DIMENSIONLESS;
    if (name === 'wavelength') {
      if (inWavelength) return error(span, 'the wavelength cannot be defined in terms of itself');
      if (!declared.has('wavelength')) return error(span, 'no wavelength is declared', 'add a line like: wavelength 405 nm');
      usesWavelength = true;
      return LENGTH;
    }
    const binding = scope.get(name);
    if (binding) {
      binding.used = true;
      if (binding.usesWavelength) {
        if (inWavelength) return error(span, `${name} depends on the wavelength, which cannot be defined in terms of itself`);
        usesWavelength = true;
      }
      return binding.ty;
    }
    const builtin = findBuiltin(name);
    if (builtin) return error(span, `${name} is a built-in function`, `call it: ${builtin.example.replace(/^\w+ = |^\w+ /, '')}`);
    if (WORDS.has(name)) return error(span, `"${name}" is an option word and only fits a parameter that takes it`);
    const later = laterNames.get(name);
    if (later !== undefined) return error(span, `${name} is used before it is defined`, `it is defined on line ${later}; move that line up`);
    const suggestion = closest(name, [...scope.keys(), ...RESERVED]);
    return error(span, `unknown name "${name}"`, suggestion ? `did you mean ${suggestion}?` : undefined);
  }

  function numberType(e: Extract<Expr, { kind: 'number' }>): Ty {
    if (e.unit === null) return DIMENSIONLESS;
    const unit = findUnit(e.unit);
    if (unit) return num(unit.length, unit.angle);
    const span = e.unitSpan ?? e.span;
    if (scope.has(e.unit) || e.unit in COORDINATES || RESERVED.has(e.unit)) {
      return error(span, `"${e.unit}" is not a unit`, `to multiply, write ${e.value} * ${e.unit}`);
    }
    const suggestion = closest(e.unit, UNITS.map((u) => u.name));
    return error(span, `unknown unit "${e.unit}"`, suggestion ? `did you mean ${suggestion}?` : `units: ${UNITS.map((u) => u.name).join(', ')}`);
  }

  function arithmetic(e: Extract<Expr, { kind: 'binary' }>, left: Ty, right: Ty): Ty {
    if (left.k === 'error' || right.k === 'error') return ERROR;
    for (const [t, side] of [[left, e.left], [right, e.right]] as const) {
      if (t.k === 'complex' || t.k === 'multiplexed') {
        return error(side.span, `a ${formatType(t)} cannot take part in arithmetic`, 'add phases before wrapping them in wave(…); combine waves with superpose(…)');
      }
      if (t.k !== 'num') return error(side.span, `"${e.op}" needs numbers, not a ${formatType(t)}`);
    }
    if (left.k !== 'num' || right.k !== 'num') return ERROR;
    const varies = left.varies || right.varies;
    switch (e.op) {
      case '+':
      case '-':
        if (!sameDimension(left, right)) {
          return error(e.span, `cannot ${e.op === '+' ? 'add' : 'subtract'} ${formatType(right)} ${e.op === '+' ? 'to' : 'from'} ${formatType(left)}`, 'both sides need the same dimension');
        }
        return num(left.L, left.A || right.A, varies);
      case '*':
        return num(left.L + right.L, left.A + right.A, varies);
      case '/':
        return num(left.L - right.L, left.A - right.A, varies);
      default: {
        if (right.L !== 0 || right.A !== 0) return error(e.right.span, `an exponent must be dimensionless, not ${formatType(right)}`);
        if (left.L === 0 && left.A === 0) return num(0, 0, varies);
        const n = literalValue(e.right);
        if (n === undefined) return error(e.right.span, `raising ${formatType(left)} to a power needs a number written out`, 'write e.g. r^2');
        if (right.varies) return error(e.right.span, 'the exponent cannot vary with position');
        if (!Number.isInteger(left.L * n) || !Number.isInteger(left.A * n)) {
          return error(e.right.span, `${formatType(left)} to the power ${n} has no unit`, 'use a whole-number power, or sqrt of an area');
        }
        return num(left.L * n, left.A * n, left.varies);
      }
    }
  }

  function binaryType(e: Extract<Expr, { kind: 'binary' }>): Ty {
    const left = typeOf(e.left);
    const right = typeOf(e.right);
    if (e.op === 'and' || e.op === 'or') {
      if (left.k === 'error' || right.k === 'error') return ERROR;
      if (left.k !== 'bool') return error(e.left.span, `"${e.op}" needs conditions, not ${formatType(left)}`);
      if (right.k !== 'bool') return error(e.right.span, `"${e.op}" needs conditions, not ${formatType(right)}`);
      return { k: 'bool', varies: left.varies || right.varies };
    }
    if (['<', '<=', '>', '>=', '==', '!='].includes(e.op)) {
      if (left.k === 'error' || right.k === 'error') return ERROR;
      if (left.k !== 'num' || right.k !== 'num') return error(e.span, `"${e.op}" compares numbers, not ${formatType(left.k !== 'num' ? left : right)}`);
      if (!sameDimension(left, right)) return error(e.span, `cannot compare ${formatType(left)} with ${formatType(right)}`);
      return { k: 'bool', varies: left.varies || right.varies };
    }
    return arithmetic(e, left, right);
  }

  function accepts(param: { name: string; type: ParamType; options?: string[] }, arg: Expr, where: string): void {
    if (param.type === 'word') {
      const options = param.options ?? [];
      if (arg.kind === 'name' && options.includes(arg.name)) return;
      const said = arg.kind === 'name' ? `"${arg.name}"` : 'this';
      const suggestion = arg.kind === 'name' ? closest(arg.name, options) : undefined;
      error(arg.span, `${where}: ${said} is not one of ${options.join(', ')}`, suggestion ? `did you mean ${suggestion}?` : undefined);
      return;
    }
    const t = typeOf(arg);
    if (t.k === 'error') return;
    const expected = describeParam(param.type);
    const bad = (hint?: string): void => void error(arg.span, `${where} must be ${expected}, not ${formatType(t)}`, hint);
    const constant = (): boolean => {
      if (t.k === 'num' && t.varies) {
        error(arg.span, `${where} must be a constant; it cannot depend on the position (x, y, r, theta)`);
        return false;
      }
      return true;
    };
    const isNum = (L: number, A: number | 'soft'): boolean => t.k === 'num' && t.L === L && (A === 'soft' ? t.A === 0 || t.A === 1 : t.A === A);
    switch (param.type) {
      case 'length':
        if (!isNum(1, 0)) return bad(t.k === 'num' && t.L === 0 && t.A === 0 ? 'a length needs its unit: nm, um, mm or m' : undefined);
        constant();
        return;
      case 'angle':
        if (!isNum(0, 1)) return bad(t.k === 'num' && t.L === 0 && t.A === 0 ? 'an angle needs its unit: rad, mrad or deg' : undefined);
        constant();
        return;
      case 'phase':
        if (!isNum(0, 'soft')) return bad();
        constant();
        return;
      case 'dimensionless':
      case 'count':
        if (!isNum(0, 0)) return bad();
        constant();
        return;
      case 'point':
      case 'point3': {
        const n = param.type === 'point' ? 2 : 3;
        if (t.k !== 'tuple' || t.items.length !== n || !t.items.every((i) => i.k === 'num' && i.L === 1 && i.A === 0)) {
          return bad(`write a point as (${Array.from({ length: n }, (_, i) => `${i * 20} um`).join(', ')})`);
        }
        if (t.items.some((i) => i.k === 'num' && i.varies)) error(arg.span, `${where} must be a constant point`);
        return;
      }
      case 'profile':
        if (t.k === 'complex' || isNum(0, 'soft')) return;
        return bad(t.k === 'multiplexed' ? 'multiplexed profiles go only straight into profile' : undefined);
      case 'phase field':
        if (isNum(0, 'soft')) return;
        return bad(t.k === 'complex' ? 'a wave takes a phase; superpose(…) already takes waves' : undefined);
      case 'number':
        if (t.k !== 'num') bad();
        return;
      default:
        if (t.k !== param.type) bad();
    }
  }

  function mathCall(e: Extract<Expr, { kind: 'call' }>, b: Builtin): Ty {
    if (e.args.some((a) => a.name !== null)) return error(e.span, `${b.name} takes its arguments by position`);
    if (e.args.length !== b.params.length) {
      return error(e.span, `${b.name} takes ${b.params.length} argument${b.params.length > 1 ? 's' : ''}, not ${e.args.length}`);
    }
    const args = e.args.map((a) => typeOf(a.value));
    if (args.some((t) => t.k === 'error')) return ERROR;
    const bad = args.findIndex((t) => t.k !== 'num');
    if (bad >= 0) return error(e.args[bad].value.span, `${b.name} needs a number, not ${formatType(args[bad])}`);
    const [a, second] = args as Extract<Ty, { k: 'num' }>[];
    const varies = args.some((t) => t.k === 'num' && t.varies);
    if (second && !sameDimension(a, second)) {
      return error(e.span, `${b.name} needs two values of one dimension, not ${formatType(a)} and ${formatType(second)}`);
    }
    switch (b.rule) {
      case 'trig':
        if (a.L !== 0) return error(e.args[0].value.span, `${b.name} needs an angle, not ${formatType(a)}`, 'divide a length by a length first');
        return num(0, 0, varies);
      case 'inverse-angle':
        return num(0, 1, varies);
      case 'sqrt':
        if (a.L % 2 !== 0 || a.A % 2 !== 0) return error(e.args[0].value.span, `sqrt of ${formatType(a)} has no unit`, 'take sqrt of an area or of a dimensionless number');
        return num(a.L / 2, a.A / 2, varies);
      case 'pure':
        if (a.L !== 0) return error(e.args[0].value.span, `${b.name} needs a dimensionless number, not ${formatType(a)}`);
        return num(0, 0, varies);
      default:
        return num(a.L, a.A || (second?.A ?? 0), varies);
    }
  }

  function callType(e: Extract<Expr, { kind: 'call' }>): Ty {
    const b = findBuiltin(e.callee);
    if (!b || b.category === 'coordinate' || b.category === 'constant') {
      e.args.forEach((a) => typeOf(a.value));
      if (scope.has(e.callee)) return error(e.calleeSpan, `${e.callee} is a value, not a function`);
      const suggestion = closest(e.callee, BUILTINS.filter((x) => x.params.length > 0 || x.variadic).map((x) => x.name));
      return error(e.calleeSpan, `unknown function "${e.callee}"`, suggestion ? `did you mean ${suggestion}?` : undefined);
    }
    if (b.category === 'math') return mathCall(e, b);
    const { given, rest, extra, unknown, repeated } = assignArguments(b, e.args);
    let ok = unknown.length + repeated.length + extra.length === 0;
    for (const a of unknown) {
      typeOf(a.value);
      const suggestion = closest(a.name ?? '', b.params.map((p) => p.name));
      error(a.nameSpan ?? a.value.span, `${b.name} has no parameter "${a.name}"`, suggestion ? `did you mean ${suggestion}?` : `parameters: ${b.params.map((p) => p.name).join(', ') || 'none, only positional values'}`);
    }
    for (const a of repeated) error(a.nameSpan ?? a.value.span, `${a.name} is given twice`);
    for (const a of extra) {
      typeOf(a.value);
      error(a.value.span, `${b.name} takes at most ${b.params.length} argument${b.params.length === 1 ? '' : 's'}`);
    }
    if (b.variadic) {
      for (const a of rest) accepts(b.variadic, a.value, `each of the ${b.variadic.name} of ${b.name}`);
      if (rest.length < b.variadic.min) {
        ok = false;
        error(e.span, `${b.name} needs at least ${b.variadic.min} ${b.variadic.name}, given ${rest.length}`);
      }
    }
    for (const p of b.params) {
      const a = given.get(p.name);
      if (a) accepts(p, a.value, `${p.name} of ${b.name}`);
      else if (p.default === undefined && !p.optional) {
        ok = false;
        error(e.span, `${b.name} needs ${p.name}: ${describeParam(p.type)}`, `e.g. ${b.example.replace(/^\w+ = |^\w+ /, '')}`);
      }
    }
    for (const group of b.oneOf ?? []) {
      const present = group.filter((n) => given.has(n));
      if (present.length !== 1) {
        ok = false;
        error(e.span, present.length === 0 ? `${b.name} needs one of ${group.join(' or ')}` : `${b.name} takes only one of ${group.join(' or ')}`);
      }
    }
    return ok ? returnType(b) : ERROR;
  }

  function typeOf(e: Expr): Ty {
    return note(e.span, rawType(e));
  }

  function rawType(e: Expr): Ty {
    switch (e.kind) {
      case 'number':
        return numberType(e);
      case 'text':
        return { k: 'text' };
      case 'name':
        return nameType(e);
      case 'unary': {
        const t = typeOf(e.operand);
        if (t.k === 'error') return ERROR;
        if (e.op === 'not') return t.k === 'bool' ? t : error(e.operand.span, `"not" needs a condition, not ${formatType(t)}`);
        return t.k === 'num' ? t : error(e.operand.span, `cannot negate a ${formatType(t)}`);
      }
      case 'binary':
        return binaryType(e);
      case 'if': {
        const c = typeOf(e.condition);
        const a = typeOf(e.then);
        const b = typeOf(e.otherwise);
        if (c.k === 'error' || a.k === 'error' || b.k === 'error') return ERROR;
        if (c.k !== 'bool') return error(e.condition.span, `the condition must be a comparison, not ${formatType(c)}`);
        if (!sameType(a, b)) return error(e.otherwise.span, `both branches need the same type: ${formatType(a)} and ${formatType(b)}`);
        if (c.varies && (a.k !== 'num' || b.k !== 'num')) {
          return error(e.condition.span, 'a condition that depends on the position can only choose between numbers');
        }
        if (a.k === 'num' && b.k === 'num') return num(a.L, a.A || b.A, a.varies || b.varies || c.varies);
        return a;
      }
      case 'tuple':
        return { k: 'tuple', items: e.items.map(typeOf) };
      case 'call':
        return callType(e);
      case 'invalid':
        return ERROR;
    }
  }

  function declaration(s: Extract<Statement, { kind: 'declare' }>, seen: Map<string, Span>): void {
    const info = DECLARATIONS.find((d) => d.keyword === s.keyword)!;
    const earlier = seen.get(s.keyword);
    if (earlier && !info.repeatable) error(s.keywordSpan, `${s.keyword} is declared twice`, `the first is on line ${earlier.start.line}`);
    seen.set(s.keyword, s.keywordSpan);
    inWavelength = s.keyword === 'wavelength';
    const t = typeOf(s.value);
    inWavelength = false;
    if (t.k === 'error') return;
    const wrong = (hint?: string): void => void error(s.value.span, `${s.keyword} must be a ${info.expects}, not ${formatType(t)}`, hint);
    switch (s.keyword) {
      case 'wavelength':
        if (!(t.k === 'num' && t.L === 1 && t.A === 0)) wrong(t.k === 'num' && t.L === 0 ? 'a length needs its unit, e.g. 405 nm' : undefined);
        else if (t.varies) error(s.value.span, 'the wavelength must be a constant');
        return;
      case 'profile':
        if (!(t.k === 'complex' || t.k === 'multiplexed' || (t.k === 'num' && t.L === 0))) wrong(t.k === 'num' && t.L !== 0 ? 'a phase is an angle or a plain number (radians); divide lengths by a length' : undefined);
        return;
      default:
        if (t.k !== DECLARED_KIND[s.keyword]) wrong(`e.g. ${info.example}`);
    }
  }

  program.statements.forEach((s) => {
    if (s.kind === 'bind' && !laterNames.has(s.name)) laterNames.set(s.name, s.span.start.line);
  });
  const seen = new Map<string, Span>();
  for (const s of program.statements) {
    if (s.kind === 'declare') {
      declaration(s, seen);
      continue;
    }
    laterNames.delete(s.name);
    usesWavelength = false;
    const ty = typeOf(s.value);
    if (RESERVED.has(s.name) || s.name in COORDINATES) {
      error(s.nameSpan, `${s.name} is a built-in name and cannot be redefined`, 'choose another name');
    } else if (scope.has(s.name)) {
      error(s.nameSpan, `${s.name} is already defined on line ${scope.get(s.name)!.span.start.line}`, 'each name is defined once');
    } else {
      scope.set(s.name, { ty, span: s.nameSpan, used: false, usesWavelength });
    }
  }
  for (const [name, b] of scope) {
    if (!b.used) diagnostics.push(warningAt(b.span, `${name} is defined but never used`));
  }
  const start = { line: 1, column: 1 };
  for (const d of DECLARATIONS) {
    if (d.required && !seen.has(d.keyword) && !program.brokenDeclarations.includes(d.keyword)) {
      diagnostics.push(errorAt({ start, end: start }, `missing ${d.keyword} declaration (${d.description})`, `add a line like: ${d.example}`));
    }
  }
  return { diagnostics, types };
}

/** A literal exponent such as 2, -1 or 0.5. */
function literalValue(e: Expr): number | undefined {
  if (e.kind === 'number' && e.unit === null) return e.value;
  if (e.kind === 'unary' && e.op === '-') {
    const v = literalValue(e.operand);
    return v === undefined ? undefined : -v;
  }
  return undefined;
}

function describeParam(type: ParamType): string {
  const words: Record<ParamType, string> = {
    length: 'a length',
    angle: 'an angle',
    phase: 'a phase (rad or waves)',
    dimensionless: 'a plain number',
    count: 'a whole number',
    point: 'a point (x, y)',
    point3: 'a point (x, y, z)',
    region: 'a region',
    text: 'a text in double quotes',
    profile: 'a phase or a wave',
    'phase field': 'a phase',
    word: 'one of the listed words',
    number: 'a number',
  };
  return words[type];
}
