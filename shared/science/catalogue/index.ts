// Public entry of catalogue: each function with its one-line summary; types and constants follow.
/** A catalogue listing without the callables, ready to print as JSON. */
export { describeCatalogue } from './function-catalogue';
/** Evaluates one catalogued function by name with named arguments. */
export { evaluateByName } from './function-catalogue';
export type { CatalogueParameter, CatalogueEntry } from './catalogue-entry';
export { FUNCTION_CATALOGUE, CatalogueLookupError } from './function-catalogue';
