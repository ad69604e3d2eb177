import { createActionGroup, props } from '@ngrx/store';
import { BatchStatus, BrewDayMeasurements } from '@shared/batches';

export const BatchPageActions = createActionGroup({
  source: 'Batch Page',
  events: {
    Opened: props<{ batchId: number }>(),
    'Status Move Chosen': props<{ batchId: number; status: BatchStatus; skipped: BatchStatus[] }>(),
    'Skip Confirmed': props<{ batchId: number; status: BatchStatus }>(),
    'Brew Day Submitted': props<{ batchId: number; measured: BrewDayMeasurements }>(),
  },
});
