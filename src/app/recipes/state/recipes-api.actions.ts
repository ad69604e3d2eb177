import { createActionGroup, props } from '@ngrx/store';
import { Recipe, RecipeSummary, RecipeVersion, RecipeVersionSummary, UserPreferences } from '@shared/recipes';

export const RecipesApiActions = createActionGroup({
  source: 'Recipes API',
  events: {
    'Recipes Loaded Success': props<{ recipes: RecipeSummary[] }>(),
    'Recipes Loaded Failure': props<{ message: string }>(),
    'Recipe Loaded Success': props<{ recipe: Recipe }>(),
    'Recipe Loaded Failure': props<{ message: string }>(),
    'Recipe Created Success': props<{ recipe: Recipe }>(),
    'Recipe Saved Success': props<{ recipe: Recipe }>(),
    'Recipe Saved Failure': props<{ message: string }>(),
    'Recipe Save Unchanged': props<{ version: number }>(),
    'Recipe Updated To Catalogue Success': props<{ recipe: Recipe; previousVersion: number }>(),
    'Recipe Updated To Catalogue Failure': props<{ message: string }>(),
    'Recipe Updated Success': props<{ recipe: Recipe }>(),
    'Recipe Updated Failure': props<{ message: string }>(),
    'Recipe Cloned Success': props<{ recipe: Recipe }>(),
    'Recipe Cloned Failure': props<{ message: string }>(),
    'Recipe Exported Success': props<{ fileName: string; json: string }>(),
    'Recipe Exported Failure': props<{ message: string }>(),
    'Recipe Imported Success': props<{ recipe: Recipe }>(),
    'Recipe Imported Failure': props<{ message: string }>(),
    'Versions Loaded Success': props<{ recipeId: number; versions: RecipeVersionSummary[] }>(),
    'Versions Loaded Failure': props<{ message: string }>(),
    'Version Pair Loaded Success': props<{ left: RecipeVersion; right: RecipeVersion }>(),
    'Version Pair Loaded Failure': props<{ message: string }>(),
    'Preferences Loaded Success': props<{ preferences: UserPreferences }>(),
    'Preferences Loaded Failure': props<{ message: string }>(),
    'Preferences Saved Success': props<{ preferences: UserPreferences }>(),
    'Preferences Saved Failure': props<{ message: string }>(),
  },
});
