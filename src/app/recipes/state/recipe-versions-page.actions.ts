import { createActionGroup, props } from '@ngrx/store';

export const RecipeVersionsPageActions = createActionGroup({
  source: 'Recipe Versions Page',
  events: {
    Opened: props<{ recipeId: number }>(),
    'Versions Picked': props<{ recipeId: number; left: number; right: number }>(),
  },
});
