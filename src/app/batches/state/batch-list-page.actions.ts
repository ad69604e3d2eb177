import { createActionGroup, props } from '@ngrx/store';

export const BatchListPageActions = createActionGroup({
  source: 'Batch List Page',
  events: {
    Opened: props<{ mine: boolean }>(),
    'Scope Changed': props<{ mine: boolean }>(),
  },
});
