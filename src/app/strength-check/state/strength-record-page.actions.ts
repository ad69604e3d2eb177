import { createActionGroup, props } from '@ngrx/store';

export const StrengthRecordPageActions = createActionGroup({
  source: 'Strength Record Page',
  events: {
    Opened: props<{ batchId: number; signOffId: number }>(),
  },
});
