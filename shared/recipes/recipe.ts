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

/** A recipe with its current design. */
export interface Recipe extends RecipeSummary {
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

export interface RecipeVersion extends RecipeVersionSummary {
  design: RecipeDesign;
}
