import { createActionGroup, emptyProps, props } from '@ngrx/store';

export const RecipeListPageActions = createActionGroup({
  source: 'Recipe List Page',
  events: {
    Opened: emptyProps(),
    'Include Archived Changed': props<{ includeArchived: boolean }>(),
    'Search Changed': props<{ search: string }>(),
    'Import File Chosen': props<{ fileName: string; text: string }>(),
  },
});
