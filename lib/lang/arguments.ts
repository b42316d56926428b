import type { Arg } from './ast';
import type { Builtin } from './builtins';

export interface AssignedArguments {
  /** arguments matched to named parameters */
  given: Map<string, Arg>;
  /** positional arguments of a variadic built-in */
  rest: Arg[];
  /** positional arguments beyond the parameter list */
  extra: Arg[];
  /** named arguments the built-in does not have */
  unknown: Arg[];
  /** named arguments given twice */
  repeated: Arg[];
}

/**
 * Matches a call's arguments to a built-in's parameters: named ones by name; positional ones
 * go to the variadic list, or else fill the parameters not yet named, in order.
 */
export function assignArguments(b: Builtin, args: Arg[]): AssignedArguments {
  const result: AssignedArguments = { given: new Map(), rest: [], extra: [], unknown: [], repeated: [] };
  const positional: Arg[] = [];
  for (const a of args) {
    if (a.name === null) positional.push(a);
    else if (!b.params.some((p) => p.name === a.name)) result.unknown.push(a);
    else if (result.given.has(a.name)) result.repeated.push(a);
    else result.given.set(a.name, a);
  }
  if (b.variadic) {
    result.rest = positional;
    return result;
  }
  const free = b.params.filter((p) => !result.given.has(p.name));
  positional.forEach((a, i) => {
    if (i < free.length) result.given.set(free[i].name, a);
    else result.extra.push(a);
  });
  return result;
}
