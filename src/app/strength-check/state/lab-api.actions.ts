import { createActionGroup, props } from '@ngrx/store';
import { ToleranceClass } from '@shared/strength-check';

export const LabApiActions = createActionGroup({
  source: 'Lab API',
  events: {
    'Tolerance Classes Loaded Success': props<{ toleranceClasses: ToleranceClass[] }>(),
    'Tolerance Classes Loaded Failure': props<{ message: string }>(),
    'Tolerance Class Saved Success': props<{ toleranceClass: ToleranceClass }>(),
    'Tolerance Class Saved Failure': props<{ message: string }>(),
  },
});
