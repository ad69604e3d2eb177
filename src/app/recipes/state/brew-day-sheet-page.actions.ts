import { createActionGroup, emptyProps, props } from '@ngrx/store';

export const BrewDaySheetPageActions = createActionGroup({
  source: 'Brew Day Sheet Page',
  events: {
    Opened: props<{ recipeId: number }>(),
    'Print Requested': emptyProps(),
  },
});
