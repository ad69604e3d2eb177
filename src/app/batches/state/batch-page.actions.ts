import { createActionGroup, props } from '@ngrx/store';
import { BatchStatus, BrewDayMeasurements, UpdateBatchRequest } from '@shared/batches';

export const BatchPageActions = createActionGroup({
  source: 'Batch Page',
  events: {
    Opened: props<{ batchId: number }>(),
    /** `at`: when the move happened (ISO instant), for a move recorded after the fact; null for now. */
    'Status Move Chosen': props<{ batchId: number; status: BatchStatus; skipped: BatchStatus[]; at: string | null }>(),
    'Skip Confirmed': props<{ batchId: number; status: BatchStatus; at: string | null }>(),
    'Details Edit Opened': props<{ batchId: number }>(),
    'Details Submitted': props<{ batchId: number; changes: UpdateBatchRequest }>(),
    'Brew Day Submitted': props<{ batchId: number; measured: BrewDayMeasurements }>(),
  },
});
