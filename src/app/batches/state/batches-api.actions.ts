import { createActionGroup, props } from '@ngrx/store';
import { Batch, BatchSummary, BrewerChoice, FermenterChoice } from '@shared/batches';
import { RecipeSummary, RecipeVersionSummary } from '@shared/recipes';

export const BatchesApiActions = createActionGroup({
  source: 'Batches API',
  events: {
    'Batches Loaded Success': props<{ batches: BatchSummary[] }>(),
    'Batches Loaded Failure': props<{ message: string }>(),
    'Batch Loaded Success': props<{ batch: Batch }>(),
    'Batch Loaded Failure': props<{ message: string }>(),
    'Start Choices Loaded Success': props<{ recipes: RecipeSummary[]; fermenters: FermenterChoice[] }>(),
    'Start Choices Loaded Failure': props<{ message: string }>(),
    'Edit Choices Loaded Success': props<{ brewers: BrewerChoice[]; fermenters: FermenterChoice[] }>(),
    'Edit Choices Loaded Failure': props<{ message: string }>(),
    'Versions Loaded Success': props<{ recipeId: number; versions: RecipeVersionSummary[] }>(),
    'Versions Loaded Failure': props<{ message: string }>(),
    'Batch Started Success': props<{ batch: Batch }>(),
    'Batch Started Failure': props<{ message: string; fields: Record<string, string> | null }>(),
    'Batch Changed Success': props<{ batch: Batch; message: string }>(),
    'Batch Changed Failure': props<{ message: string; fields: Record<string, string> | null }>(),
  },
});
