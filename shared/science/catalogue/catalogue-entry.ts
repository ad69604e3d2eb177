import { ScienceRangeError } from '../units/science-range-error';

/** One parameter of a catalogued function: its name, unit and whether it may be left out. */
export interface CatalogueParameter {
  name: string;
  unit: string;
  kind: 'number' | 'json' | 'text';
  optional?: boolean;
  description?: string;
}

/** A public function described for scripting: name, parameters with units, result unit, and a call by name. */
export interface CatalogueEntry {
  name: string;
  summary: string;
  parameters: CatalogueParameter[];
  returns: string;
  call(args: Record<string, unknown>): unknown;
}

/** Shorthand for a required numeric parameter. */
export function num(name: string, unit: string, description?: string): CatalogueParameter {
  return { name, unit, kind: 'number', description };
}

/** Shorthand for an optional numeric parameter (the function's default applies). */
export function opt(name: string, unit: string, description?: string): CatalogueParameter {
  return { name, unit, kind: 'number', optional: true, description };
}

/** Reads a numeric argument, throwing a ScienceRangeError that names it when it is missing. */
export function arg(args: Record<string, unknown>, name: string): number {
  const value = args[name];
  if (typeof value !== 'number') {
    throw new ScienceRangeError(name, Number.NaN, -Infinity, Infinity, '', 'not-a-number', `${name} is required and must be a number`);
  }
  return value;
}

/** Reads an optional numeric argument (undefined lets the function's default apply). */
export function optionalArg(args: Record<string, unknown>, name: string): number | undefined {
  return args[name] === undefined ? undefined : arg(args, name);
}

/** Shorthand for a JSON parameter (an array or object given as JSON text on the command line). */
export function json(name: string, unit: string, description?: string, optional = false): CatalogueParameter {
  return { name, unit, kind: 'json', description, optional };
}

/** Shorthand for an optional text parameter, such as a choice from a list. */
export function text(name: string, unit: string, description?: string): CatalogueParameter {
  return { name, unit, kind: 'text', optional: true, description };
}

/** Reads a JSON argument (already parsed), throwing a ScienceRangeError that names it when missing or not an object. */
export function jsonArg<T>(args: Record<string, unknown>, name: string): T {
  const value = args[name];
  if (typeof value !== 'object' || value === null) {
    throw new ScienceRangeError(name, Number.NaN, -Infinity, Infinity, '', 'not-a-number', `${name} is required as JSON (an array or object)`);
  }
  return value as T;
}

/** Builds an entry for a function whose parameters are all numbers, passed in order. */
export function numericEntry(
  name: string, summary: string, parameters: CatalogueParameter[], returns: string,
  fn: (...values: never[]) => unknown,
): CatalogueEntry {
  return {
    name, summary, parameters, returns,
    call: (args) => (fn as (...v: (number | undefined)[]) => unknown)(
      ...parameters.map((p) => (p.optional ? optionalArg(args, p.name) : arg(args, p.name))),
    ),
  };
}
