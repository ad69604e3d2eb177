import { SessionUser } from '@shared/auth';
import { canonicalJson, Recipe, RecipeSummary } from '@shared/recipes';
import { RecipeRecord, StoredVersion } from './recipes.repository';

/** A row of the recipe list. */
export function toSummary(row: RecipeRecord): RecipeSummary {
  return {
    id: row.id,
    name: row.name,
    ownerId: row.owner_user_id,
    ownerName: row.owner_name,
    visibility: row.visibility,
    archived: row.archived_at !== null,
    version: row.current_version,
    styleId: row.design.styleId,
    batchVolumeLitres: row.design.batchVolumeLitres,
    updatedAt: row.updated_at.toISOString(),
  };
}

/** True when two versions hold the same design made with the same properties and brewhouse. */
export function sameVersion(a: StoredVersion, b: StoredVersion): boolean {
  const content = (v: StoredVersion) => canonicalJson({ design: v.design, ingredients: v.ingredients, brewhouse: v.brewhouse });
  return content(a) === content(b);
}

/** A recipe with its current version's design and snapshot, as the caller sees it. */
export function toRecipe(row: RecipeRecord, user: SessionUser): Recipe {
  return {
    ...toSummary(row),
    design: row.design,
    designFormat: row.designFormat,
    ingredients: row.ingredients,
    brewhouse: row.brewhouse,
    editable: row.owner_user_id === user.id,
    createdAt: row.created_at.toISOString(),
  };
}
