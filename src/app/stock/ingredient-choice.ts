import { IngredientCatalogue, IngredientKind } from '@shared/recipes';

/** An ingredient a lot may be received for, from any kind of the catalogue. */
export interface IngredientChoice {
  ingredientId: number;
  name: string;
  kind: IngredientKind;
}

/** Every catalogue entry not retired, by kind then name. */
export function ingredientChoices(catalogue: IngredientCatalogue): IngredientChoice[] {
  return (['fermentables', 'hops', 'yeasts', 'others'] as const).flatMap((kind) =>
    catalogue[kind]
      .filter((entry) => !entry.retired)
      .map((entry) => ({ ingredientId: entry.ingredientId, name: entry.name, kind }))
      .sort((a, b) => a.name.localeCompare(b.name)),
  );
}
