import { createSelector } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { batchStrengthFeature } from './batch-strength.feature';
import { toleranceClassesFeature } from './tolerance-classes.feature';

/** Brewers sign off declared strengths and record lab analyses. */
export const selectIsBrewer = createSelector(authFeature.selectRoles, (roles) => roles.includes('brewer'));

export const selectBatchStrengthPageViewModel = createSelector(
  batchStrengthFeature.selectBatchStrengthState,
  toleranceClassesFeature.selectAllToleranceClasses,
  selectIsBrewer,
  (state, classes, isBrewer) => ({ ...state, classes, isBrewer }),
);
