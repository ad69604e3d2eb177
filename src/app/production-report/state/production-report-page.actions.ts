import { createActionGroup, props } from '@ngrx/store';

export const ProductionReportPageActions = createActionGroup({
  source: 'Production Report Page',
  events: {
    Opened: props<{ from: string; to: string }>(),
    'Range Changed': props<{ from: string; to: string }>(),
  },
});
