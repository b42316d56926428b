/**
 * The phase-profile language: parse, check and compile design scripts.
 * Pure TypeScript, shared by the server, the CLI and the browser.
 */
import type { CompiledDesign } from '../design/types';
import type { PhaseMap } from '../phasemap/types';
import type { TypeNote } from './checker';
import { checkProgram } from './checker';
import { compileProgram } from './compile';
import type { Diagnostic } from './diagnostic';
import { errorAt, hasErrors } from './diagnostic';
import { parse } from './parser';

export type { Diagnostic, Position, Span } from './diagnostic';
export type { PhaseMap } from '../phasemap/types';
export type { TypeNote } from './checker';
export type { Builtin, BuiltinParam, DeclarationInfo } from './builtins';
export { BUILTINS, DECLARATIONS, findBuiltin } from './builtins';
export { UNITS } from './units';
export { describeDesign } from './summary';
export { regionBox } from '../design/region-box';
export { regionContains } from '../design/region-contains';
export { parse } from './parser';
export { printProgram } from './printer';

/** Scripts longer than this are refused before parsing (bounded work for the checker). */
export const MAX_SCRIPT_LENGTH = 200_000;

export interface ScriptEnv {
  phaseMaps?: (name: string) => PhaseMap | undefined;
}

export type CompileResult =
  | { ok: true; design: CompiledDesign; diagnostics: Diagnostic[] }
  | { ok: false; diagnostics: Diagnostic[] };

const ORIGIN = { line: 1, column: 1 };

function byPosition(a: Diagnostic, b: Diagnostic): number {
  return a.start.line - b.start.line || a.start.column - b.start.column;
}

function run(source: string, env: ScriptEnv, lenientMaps: boolean): { diagnostics: Diagnostic[]; types: TypeNote[]; design: CompiledDesign | null } {
  if (typeof source !== 'string') return { diagnostics: [errorAt({ start: ORIGIN, end: ORIGIN }, 'the script must be text')], types: [], design: null };
  if (source.length > MAX_SCRIPT_LENGTH) {
    return { diagnostics: [errorAt({ start: ORIGIN, end: ORIGIN }, `the script is ${source.length} characters long; at most ${MAX_SCRIPT_LENGTH} are allowed`)], types: [], design: null };
  }
  try {
    const parsed = parse(source);
    const checked = checkProgram(parsed.program);
    const diagnostics = [...parsed.diagnostics, ...checked.diagnostics];
    if (hasErrors(diagnostics)) return { diagnostics: diagnostics.sort(byPosition), types: checked.types, design: null };
    const compiled = compileProgram(parsed.program, env, { lenientMaps });
    return { diagnostics: [...diagnostics, ...compiled.diagnostics].sort(byPosition), types: checked.types, design: compiled.design };
  } catch (error) {
    // A bug of ours must not reach the user as a stack trace.
    const message = error instanceof RangeError ? 'the script is nested too deeply to check' : 'the checker failed on this script; please report it';
    return { diagnostics: [errorAt({ start: ORIGIN, end: ORIGIN }, message)], types: [], design: null };
  }
}

/** Every problem in the script, errors and warnings, in one pass. Never throws. */
export function checkScript(source: string): Diagnostic[] {
  return run(source, {}, true).diagnostics;
}

/** Diagnostics plus the type of every expression (for editor hovers). Never throws. */
export function analyzeScript(source: string): { diagnostics: Diagnostic[]; types: TypeNote[] } {
  const { diagnostics, types } = run(source, {}, true);
  return { diagnostics, types };
}

/** Compiles a script to the CompiledDesign contract. Never throws. */
export function compileScript(source: string, env: ScriptEnv = {}): CompileResult {
  const { diagnostics, design } = run(source, env, false);
  if (!design || hasErrors(diagnostics)) {
    return { ok: false, diagnostics: diagnostics.length > 0 ? diagnostics : [errorAt({ start: ORIGIN, end: ORIGIN }, 'the script did not compile')] };
  }
  return { ok: true, design, diagnostics };
}
