import { predictRecipe, RecipePrediction, RecipeVersion } from '@shared/recipes';

/** A saved version with the figures its own snapshot gives. */
export interface SavedVersionWithPredictions extends RecipeVersion {
  prediction: RecipePrediction;
}

/** Predicts a saved version from what it was saved with; today's catalogue and brewhouse play no part. */
export function withPredictions(version: RecipeVersion): SavedVersionWithPredictions {
  return { ...version, prediction: predictRecipe(version.design, version.ingredients, version.brewhouse) };
}
