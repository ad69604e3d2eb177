import { createActionGroup, props } from '@ngrx/store';
import { BatchSummary } from '@shared/batches';
import { BatchStrengthCheck, DistillateAnalysisResult, SignOffRequest, StrengthRecord } from '@shared/strength-check';

export const BatchStrengthApiActions = createActionGroup({
  source: 'Batch Strength API',
  events: {
    'Batches Loaded Success': props<{ batches: BatchSummary[] }>(),
    'Batches Loaded Failure': props<{ message: string }>(),
    'Check Loaded Success': props<{ check: BatchStrengthCheck; declared: SignOffRequest | null }>(),
    'Check Loaded Failure': props<{ message: string }>(),
    'Signed Off Success': props<{ record: StrengthRecord }>(),
    'Signed Off Failure': props<{ message: string }>(),
    'Record Loaded Success': props<{ record: StrengthRecord }>(),
    'Record Loaded Failure': props<{ message: string }>(),
    'Analysis Recorded Success': props<{ analysis: DistillateAnalysisResult }>(),
    'Analysis Recorded Failure': props<{ message: string; fields: Record<string, string> | null }>(),
  },
});
