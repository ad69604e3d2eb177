import { IngredientKind } from './ingredient';
import { OtherUnit, RecipeDesign } from './recipe-design';
import { RecipeVisibility } from './recipe';

export const RECIPES_PATH = '/api/recipes';
export const INGREDIENTS_PATH = '/api/ingredients';
export const STYLES_PATH = '/api/styles';
export const BREWHOUSE_PATH = '/api/brewhouse';

/*
 * Routes (roles in brackets; "any" = any signed-in person):
 *   GET    /api/ingredients                          [any]  IngredientCatalogue (?includeRetired=true)
 *   POST   /api/ingredients/:kind                    [brewer, admin]  body: the kind's *Input → the entry (201)
 *   PATCH  /api/ingredients/:kind/:ingredientId      [brewer, admin]  body: Partial<*Input> & { retired?: boolean }
 *   POST   /api/ingredients/:kind/import             [brewer, admin]  CatalogueImportRequest → CatalogueImportResult
 *   GET    /api/styles                               [any]  StyleTarget[]
 *   POST   /api/styles                               [brewer, admin]  StyleTargetInput → StyleTarget (201)
 *   PUT    /api/styles/:styleId                      [brewer, admin]  StyleTargetInput → StyleTarget
 *   GET    /api/brewhouse                            [any]  BrewhouseSettings
 *   PUT    /api/brewhouse                            [brewer, admin]  BrewhouseSettings
 *   GET    /api/recipes                              [any]  RecipeSummary[] (own + co-op visible; ?includeArchived=true)
 *   POST   /api/recipes                              [any]  CreateRecipeRequest → Recipe (201, version 1)
 *   GET    /api/recipes/:recipeId                    [any who can see it]  Recipe
 *   PUT    /api/recipes/:recipeId                    [owner]  SaveRecipeRequest → Recipe (a new version)
 *   PATCH  /api/recipes/:recipeId                    [owner; admin may archive any]  UpdateRecipeRequest → Recipe
 *   POST   /api/recipes/:recipeId/clone              [any who can see it]  CloneRecipeRequest → Recipe (201, owned by the caller)
 *   GET    /api/recipes/:recipeId/versions           [any who can see it]  RecipeVersionSummary[]
 *   GET    /api/recipes/:recipeId/versions/:version  [any who can see it]  RecipeVersion
 *   GET    /api/recipes/:recipeId/export             [any who can see it]  RecipeExport
 *   POST   /api/recipes/import                       [any]  RecipeExport → Recipe (201)
 *   GET    /api/preferences  PUT /api/preferences    [any]  UserPreferences
 */

export interface CreateRecipeRequest {
  design: RecipeDesign;
  visibility: RecipeVisibility;
}

export interface SaveRecipeRequest {
  design: RecipeDesign;
}

export interface UpdateRecipeRequest {
  visibility?: RecipeVisibility;
  archived?: boolean;
}

export interface CloneRecipeRequest {
  name?: string;
}

/** What to do with a CSV row whose name the catalogue already has. */
export const IMPORT_CHOICES = ['skip', 'update'] as const;
export type ImportChoice = (typeof IMPORT_CHOICES)[number];

/** CSV import of one kind of catalogue entry: with `commit: false` it only previews. */
export interface CatalogueImportRequest {
  csv: string;
  commit: boolean;
  /** The brewer's choice for each row (by line) whose name is already in the catalogue. */
  choices?: { line: number; choice: ImportChoice }[];
}

export interface CatalogueImportProblem {
  /** 1-based line of the CSV file (line 1 is the header). */
  line: number;
  reason: string;
}

/** A valid row whose name the catalogue already holds (compared as the database compares names). */
export interface CatalogueImportExisting {
  line: number;
  name: string;
  existingId: number;
  existingName: string;
}

export interface CatalogueImportResult {
  kind: IngredientKind;
  /** Rows understood, in file order. */
  rows: Record<string, string | number | null>[];
  /** Rows that cannot be imported as they are: nothing is imported while there is one. */
  problems: CatalogueImportProblem[];
  /** Rows naming an existing entry: each needs a choice, skip or update, before the import. */
  existing: CatalogueImportExisting[];
  /** Entries added, changed and left alone: all 0 unless `commit` was true and nothing blocked it. */
  imported: number;
  updated: number;
  skipped: number;
}

/** Format name and version of the project's own recipe file; see docs/recipe-format.md. */
export const RECIPE_EXPORT_FORMAT = 'commonwort-recipe';
export const RECIPE_EXPORT_VERSION = 2;
/** Versions a reader accepts: 1 had free-text units for other additions. */
export const RECIPE_EXPORT_READABLE_VERSIONS = [1, 2] as const;

/** A recipe file: ingredients are carried by name and properties so another co-op can import it. */
export interface RecipeExport {
  format: typeof RECIPE_EXPORT_FORMAT;
  formatVersion: typeof RECIPE_EXPORT_VERSION;
  exportedAt: string;
  design: Omit<RecipeDesign, 'styleId' | 'fermentables' | 'hops' | 'yeastId' | 'others'> & {
    styleName: string | null;
    fermentables: { name: string; kind: string; extractPercent: number; colourLovibond: number; amountKg: number }[];
    hops: { name: string; alphaAcidPercent: number; form: string; amountGrams: number; time: number; use: string }[];
    yeast: { name: string; attenuationMinPercent: number; attenuationMaxPercent: number } | null;
    others: { name: string; kind: string; amount: number; unit: OtherUnit; when: string }[];
  };
}

export const UNIT_SYSTEMS = ['metric', 'us'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

export interface UserPreferences {
  unitSystem: UnitSystem;
}
