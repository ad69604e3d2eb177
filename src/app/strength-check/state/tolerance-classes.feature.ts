import { createEntityAdapter, EntityState } from '@ngrx/entity';
import { createFeature, createReducer, createSelector, on } from '@ngrx/store';
import { ToleranceClass } from '@shared/strength-check';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { LabApiActions } from './lab-api.actions';
import { StrengthCheckPageActions } from './strength-check-page.actions';

export interface ToleranceClassesState extends EntityState<ToleranceClass> {
  loading: boolean;
  loadError: string | null;
  saving: boolean;
  /** Counts saves so the form can clear after each one. */
  savedCount: number;
}

export const toleranceClassesAdapter = createEntityAdapter<ToleranceClass>({ sortComparer: (a, b) => a.name.localeCompare(b.name) });

export const initialToleranceClassesState: ToleranceClassesState = toleranceClassesAdapter.getInitialState({ loading: false, loadError: null, saving: false, savedCount: 0 });

export const toleranceClassesFeature = createFeature({
  name: 'toleranceClasses',
  reducer: createReducer(
    initialToleranceClassesState,
    on(StrengthCheckPageActions.opened, (state): ToleranceClassesState => ({ ...state, loading: true, loadError: null })),
    on(LabApiActions.toleranceClassesLoadedSuccess, (state, { toleranceClasses }): ToleranceClassesState =>
      toleranceClassesAdapter.setAll(toleranceClasses, { ...state, loading: false })),
    on(LabApiActions.toleranceClassesLoadedFailure, (state, { message }): ToleranceClassesState => ({ ...state, loading: false, loadError: message })),
    on(StrengthCheckPageActions.toleranceClassAdded, StrengthCheckPageActions.toleranceClassChanged, (state): ToleranceClassesState => ({ ...state, saving: true })),
    on(LabApiActions.toleranceClassSavedSuccess, (state, { toleranceClass }): ToleranceClassesState =>
      toleranceClassesAdapter.setOne(toleranceClass, { ...state, saving: false, savedCount: state.savedCount + 1 })),
    on(LabApiActions.toleranceClassSavedFailure, (state): ToleranceClassesState => ({ ...state, saving: false })),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (): ToleranceClassesState => initialToleranceClassesState),
  ),
  extraSelectors: ({ selectToleranceClassesState }) => ({
    selectAllToleranceClasses: createSelector(selectToleranceClassesState, toleranceClassesAdapter.getSelectors().selectAll),
  }),
});
