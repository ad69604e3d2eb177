import { createSelector } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { batchStrengthFeature } from './batch-strength.feature';
import { toleranceClassesFeature } from './tolerance-classes.feature';

/** The Strength check page: product classes, and whether the person may keep them. */
export const selectStrengthCheckPageViewModel = createSelector(
  toleranceClassesFeature.selectAllToleranceClasses,
  toleranceClassesFeature.selectToleranceClassesState,
  authFeature.selectIsAdmin,
  batchStrengthFeature.selectBatches,
  (toleranceClasses, state, isAdmin, batches) => ({ toleranceClasses, saving: state.saving, savedCount: state.savedCount, loadError: state.loadError, isAdmin, batches }),
);
