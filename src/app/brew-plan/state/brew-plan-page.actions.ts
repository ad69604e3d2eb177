import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { AcceptSlotRequest, MovePlannedBatchRequest, ProposalRequest } from '@shared/brew-plan';

export const BrewPlanPageActions = createActionGroup({
  source: 'Brew Plan Page',
  events: {
    Opened: props<{ from: string; mayPlan: boolean }>(),
    'Period Changed': props<{ from: string }>(),
    'Proposals Requested': props<{ request: ProposalRequest }>(),
    /** Any edit to the plan form: proposals made for the old values no longer apply. */
    'Plan Form Changed': emptyProps(),
    'Slot Accepted': props<{ request: AcceptSlotRequest }>(),
    'Batch Move Submitted': props<{ batchId: number; request: MovePlannedBatchRequest }>(),
  },
});
