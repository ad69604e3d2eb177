import { createSelector } from '@ngrx/store';
import { auditFittedCurve } from '@shared/reference-tables';
import { authFeature } from '@app/auth/state/auth.feature';
import { referenceTablesFeature } from './reference-tables.feature';

/** Brewers upload, correct and choose tables. */
export const selectCanKeepTables = createSelector(authFeature.selectRoles, (roles) => roles.includes('brewer'));

export const selectReferenceTablesPageViewModel = createSelector(
  referenceTablesFeature.selectReferenceTablesState,
  selectCanKeepTables,
  (state, canKeep) => ({ ...state, canKeep }),
);

/** The open table, its rows joined to their audit, and the fitted curve for the chart. */
export const selectReferenceTablePageViewModel = createSelector(
  referenceTablesFeature.selectReferenceTablesState,
  selectCanKeepTables,
  (state, canKeep) => {
    const table = state.current;
    const rows = table ? table.rows.map((row, i) => ({ row, audit: table.audit.rows[i] })) : [];
    const curve = table ? auditFittedCurve(table.audit, table.temperature) : [];
    return { table, rows, curve, canKeep, loading: state.loading, loadError: state.loadError, correcting: state.correcting, correctedCount: state.correctedCount };
  },
);
