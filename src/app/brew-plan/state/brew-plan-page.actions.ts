import { createActionGroup, props } from '@ngrx/store';
import { AcceptSlotRequest, MovePlannedBatchRequest, ProposalRequest } from '@shared/brew-plan';

export const BrewPlanPageActions = createActionGroup({
  source: 'Brew Plan Page',
  events: {
    Opened: props<{ from: string; mayPlan: boolean }>(),
    'Period Changed': props<{ from: string }>(),
    'Proposals Requested': props<{ request: ProposalRequest }>(),
    'Slot Accepted': props<{ request: AcceptSlotRequest }>(),
    'Batch Move Submitted': props<{ batchId: number; request: MovePlannedBatchRequest }>(),
  },
});
