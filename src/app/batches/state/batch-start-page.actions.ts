import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { CreateBatchRequest } from '@shared/batches';

export const BatchStartPageActions = createActionGroup({
  source: 'Batch Start Page',
  events: {
    Opened: emptyProps(),
    'Recipe Chosen': props<{ recipeId: number }>(),
    'Start Submitted': props<{ request: CreateBatchRequest }>(),
  },
});
