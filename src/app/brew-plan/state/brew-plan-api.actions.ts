import { createActionGroup, props } from '@ngrx/store';
import { BrewerChoice } from '@shared/batches';
import { BrewPlanTimeline, PlannedBatch, SlotProposals } from '@shared/brew-plan';
import { RecipeSummary } from '@shared/recipes';
import { FieldErrors } from '@app/ui/server-field-errors';

export const BrewPlanApiActions = createActionGroup({
  source: 'Brew Plan API',
  events: {
    'Timeline Loaded Success': props<{ timeline: BrewPlanTimeline }>(),
    'Timeline Loaded Failure': props<{ message: string }>(),
    'Recipes Loaded Success': props<{ recipes: RecipeSummary[] }>(),
    'Recipes Loaded Failure': props<{ message: string }>(),
    'Brewers Loaded Success': props<{ brewers: BrewerChoice[] }>(),
    'Brewers Loaded Failure': props<{ message: string }>(),
    'Proposals Loaded Success': props<{ proposals: SlotProposals }>(),
    'Proposals Loaded Failure': props<{ message: string; fields: FieldErrors | null }>(),
    'Slot Accepted Success': props<{ planned: PlannedBatch }>(),
    'Slot Accepted Failure': props<{ message: string; fields: FieldErrors | null }>(),
    'Batch Moved Success': props<{ planned: PlannedBatch }>(),
    'Batch Moved Failure': props<{ batchId: number; message: string }>(),
  },
});
