import { createActionGroup, props } from '@ngrx/store';
import { DistillateAnalysisRequest, SignOffRequest } from '@shared/strength-check';

export const BatchStrengthPageActions = createActionGroup({
  source: 'Batch Strength Page',
  events: {
    Opened: props<{ batchId: number }>(),
    'Declared Strength Checked': props<{ batchId: number; declared: SignOffRequest }>(),
    'Sign Off Requested': props<{ batchId: number; request: SignOffRequest }>(),
    'Distillate Analysed': props<{ request: DistillateAnalysisRequest }>(),
  },
});
