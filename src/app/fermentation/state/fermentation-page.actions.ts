import { createActionGroup, props } from '@ngrx/store';

export const FermentationPageActions = createActionGroup({
  source: 'Fermentation Page',
  events: {
    Opened: props<{ batchId: number }>(),
  },
});
