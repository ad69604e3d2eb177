import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { AcceptSlotRequest, MovePlannedBatchRequest, ProposalRequest } from '@shared/brew-plan';

export const BrewPlanPageActions = createActionGroup({
  source: 'Brew Plan Page',
  events: {
    /** `mayChooseBrewer`: an admin, who may plan a batch for another brewer. */
    Opened: props<{ from: string; mayPlan: boolean; mayChooseBrewer: boolean }>(),
    'Period Changed': props<{ from: string }>(),
    'Proposals Requested': props<{ request: ProposalRequest }>(),
    /** Any edit to the plan form: proposals made for the old values no longer apply. */
    'Plan Form Changed': emptyProps(),
    'Slot Accepted': props<{ request: AcceptSlotRequest }>(),
    'Batch Move Submitted': props<{ batchId: number; request: MovePlannedBatchRequest }>(),
  },
});
