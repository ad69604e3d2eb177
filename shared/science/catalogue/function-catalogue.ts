import type { CatalogueEntry } from './catalogue-entry';
import { ETHANOL_WATER_ENTRIES } from './ethanol-water-entries';
import { GRAVITY_ENTRIES } from './gravity-entries';
import { STRENGTH_ENTRIES } from './strength-entries';
import { RECIPE_ENTRIES } from './recipe-entries';
import { CARBONATION_ENTRIES } from './carbonation-entries';
import { ANALYSIS_ENTRIES } from './analysis-entries';

/** Every public function that can be called by name, in a stable order. */
export const FUNCTION_CATALOGUE: readonly CatalogueEntry[] = [
  ...GRAVITY_ENTRIES, ...ETHANOL_WATER_ENTRIES, ...STRENGTH_ENTRIES, ...RECIPE_ENTRIES, ...CARBONATION_ENTRIES, ...ANALYSIS_ENTRIES,
];

/** A catalogue listing without the callables, ready to print as JSON. */
export function describeCatalogue(): { name: string; summary: string; parameters: CatalogueEntry['parameters']; returns: string }[] {
  return FUNCTION_CATALOGUE.map(({ name, summary, parameters, returns }) => ({ name, summary, parameters, returns }));
}

/** Thrown for a name that is not in the catalogue or an argument the function does not take. */
export class CatalogueLookupError extends Error {
  override readonly name = 'CatalogueLookupError';
}

/** Evaluates one catalogued function by name with named arguments. */
export function evaluateByName(name: string, args: Record<string, unknown>): unknown {
  const entry = FUNCTION_CATALOGUE.find((e) => e.name === name);
  if (!entry) throw new CatalogueLookupError(`unknown function "${name}"; --list shows the available ones`);
  const known = new Set(entry.parameters.map((p) => p.name));
  const unknown = Object.keys(args).filter((k) => !known.has(k));
  if (unknown.length > 0) {
    throw new CatalogueLookupError(`${name} takes no parameter ${unknown.map((k) => `--${k}`).join(', ')}; it takes ${[...known].map((k) => `--${k}`).join(', ') || 'none'}`);
  }
  return entry.call(args);
}

