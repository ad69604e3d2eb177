import { createActionGroup, props } from '@ngrx/store';

/** The draw from stock on a batch: offered from the batch page, or after the batch moved to brewing. */
export const DrawDialogActions = createActionGroup({
  source: 'Draw Dialog',
  events: {
    'Draw Offered': props<{ batchId: number }>(),
    'Draw Confirmed': props<{ batchId: number; acceptShortfall: boolean }>(),
  },
});
