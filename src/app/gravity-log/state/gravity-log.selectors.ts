import { createSelector } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { readingsFeature } from './readings.feature';

export const selectGravityLogViewModel = createSelector(
  readingsFeature.selectReadingsState,
  readingsFeature.selectAll,
  authFeature.selectCoopTimeZone,
  (state, readings, coopTimeZone) => ({
    batch: state.batch,
    batchError: state.batchError,
    readings,
    total: state.total,
    pageIndex: state.pageIndex,
    pageSize: state.pageSize,
    sort: state.sort,
    direction: state.direction,
    loading: state.loading,
    error: state.error,
    saving: state.saving,
    fieldErrors: state.fieldErrors,
    savedRevision: state.savedRevision,
    importState: state.import,
    pushTokens: state.pushTokens,
    issuedToken: state.issuedToken,
    coopTimeZone,
  }),
);
