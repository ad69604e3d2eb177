import { createSelector } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { toleranceClassesFeature } from './tolerance-classes.feature';

/** The Strength check page: product classes, and whether the person may keep them. */
export const selectStrengthCheckPageViewModel = createSelector(
  toleranceClassesFeature.selectAllToleranceClasses,
  toleranceClassesFeature.selectToleranceClassesState,
  authFeature.selectIsAdmin,
  (toleranceClasses, state, isAdmin) => ({ toleranceClasses, saving: state.saving, savedCount: state.savedCount, loadError: state.loadError, isAdmin }),
);
