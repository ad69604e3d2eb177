import { createActionGroup, props } from '@ngrx/store';

/** What the owner or admin said yes to (or needed no question for) before a recipe leaves the list. */
export const RecipeArchiveConfirmationActions = createActionGroup({
  source: 'Recipe Archive Confirmation',
  events: {
    'Archive Confirmed': props<{ recipeId: number; archived: boolean }>(),
  },
});
