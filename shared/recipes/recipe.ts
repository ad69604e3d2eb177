import { BrewhouseSettings } from './brewhouse-settings';
import { IngredientCatalogue } from './ingredient';
import { RecipeDesign } from './recipe-design';

export const RECIPE_VISIBILITIES = ['private', 'coop'] as const;
/** private: only the owner sees it; coop: every member may view and clone it, only the owner edits. */
export type RecipeVisibility = (typeof RECIPE_VISIBILITIES)[number];

/** A row of the recipe list. */
export interface RecipeSummary {
  id: number;
  name: string;
  ownerId: number;
  ownerName: string;
  visibility: RecipeVisibility;
  archived: boolean;
  version: number;
  styleId: number | null;
  batchVolumeLitres: number;
  updatedAt: string;
}

/**
 * What a version was made with: the ingredient properties (only the entries its design uses) and the
 * brewhouse settings at the time. Predictions of a saved version read these, never today's catalogue.
 */
export interface VersionSnapshot {
  /** RECIPE_DESIGN_FORMAT when the version was saved. */
  designFormat: number;
  ingredients: IngredientCatalogue;
  brewhouse: BrewhouseSettings;
}

/** A recipe with its current design and that version's snapshot. */
export interface Recipe extends RecipeSummary, VersionSnapshot {
  design: RecipeDesign;
  /** True when the caller may change it (the owner). */
  editable: boolean;
  createdAt: string;
}

export interface RecipeVersionSummary {
  version: number;
  createdAt: string;
  createdBy: string;
}

export interface RecipeVersion extends RecipeVersionSummary, VersionSnapshot {
  design: RecipeDesign;
}
