import { createActionGroup, emptyProps, props } from '@ngrx/store';

export const ShoppingListPageActions = createActionGroup({
  source: 'Shopping List Page',
  events: {
    Opened: emptyProps(),
    'Horizon Changed': props<{ from: string; to: string }>(),
  },
});
