import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { ToleranceClassInput } from '@shared/strength-check';

export const StrengthCheckPageActions = createActionGroup({
  source: 'Strength Check Page',
  events: {
    Opened: emptyProps(),
    'Tolerance Class Added': props<{ input: ToleranceClassInput }>(),
    'Tolerance Class Changed': props<{ id: number; input: ToleranceClassInput }>(),
  },
});
