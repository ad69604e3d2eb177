import { Knex } from 'knex';
import { INGREDIENT_KINDS, IngredientCatalogue, idsUsedBy, RECIPE_DESIGN_FORMAT, RecipeDesign, VersionSnapshot } from '@shared/recipes';
import { brewhouseRepository } from '../brewhouse/brewhouse.repository';
import { CATALOGUE_KINDS } from '../catalogue/catalogue-kinds';
import { catalogueRepository } from '../catalogue/catalogue.repository';
import { StoredVersion } from './recipes.repository';

/**
 * What a design is saved with. Entries the previous version already had keep the properties they
 * were saved with, and so does the brewhouse; only entries new to the design are read from today's
 * catalogue. Without a previous version (a new recipe, or the explicit update to the catalogue's
 * current values) everything is read as it is now.
 */
export async function snapshotFor(db: Knex, design: RecipeDesign, previous: VersionSnapshot | null): Promise<StoredVersion> {
  const ids = idsUsedBy(design);
  const ingredients = {} as Record<string, unknown[]>;
  for (const kind of INGREDIENT_KINDS) {
    const kept = ((previous?.ingredients[kind] ?? []) as { id: number }[]).filter((entry) => ids[kind].includes(entry.id));
    const missing = ids[kind].filter((id) => !kept.some((entry) => entry.id === id));
    const fresh = await catalogueRepository.listByIds(db, CATALOGUE_KINDS[kind], missing);
    ingredients[kind] = [...kept, ...fresh].sort((a, b) => ids[kind].indexOf((a as { id: number }).id) - ids[kind].indexOf((b as { id: number }).id));
  }
  return {
    design,
    designFormat: RECIPE_DESIGN_FORMAT,
    ingredients: ingredients as unknown as IngredientCatalogue,
    brewhouse: previous?.brewhouse ?? (await brewhouseRepository.load(db)),
  };
}
