import { createFeature, createReducer, on } from '@ngrx/store';
import { ReferenceTableDetail, ReferenceTableSummary } from '@shared/reference-tables';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { ReferenceTablePageActions } from './reference-table-page.actions';
import { ReferenceTablesApiActions } from './reference-tables-api.actions';
import { ReferenceTablesPageActions } from './reference-tables-page.actions';

export interface ReferenceTablesState {
  tables: ReferenceTableSummary[];
  labTableId: number | null;
  current: ReferenceTableDetail | null;
  loading: boolean;
  loadError: string | null;
  uploading: boolean;
  /** The server's reasons, per line of the file, for refusing the last upload. */
  uploadProblems: Record<string, string> | null;
  uploadError: string | null;
  correcting: boolean;
  /** Counts saved corrections so the correction form can close after each one. */
  correctedCount: number;
}

export const initialReferenceTablesState: ReferenceTablesState = {
  tables: [], labTableId: null, current: null, loading: false, loadError: null, uploading: false, uploadProblems: null, uploadError: null, correcting: false, correctedCount: 0,
};

export const referenceTablesFeature = createFeature({
  name: 'referenceTables',
  reducer: createReducer(
    initialReferenceTablesState,
    on(ReferenceTablesPageActions.opened, (state): ReferenceTablesState => ({ ...state, loading: true, loadError: null, uploadProblems: null, uploadError: null })),
    on(ReferenceTablePageActions.opened, (state, { tableId }): ReferenceTablesState => ({ ...state, loading: true, loadError: null, current: state.current?.id === tableId ? state.current : null })),
    on(ReferenceTablesApiActions.listLoadedSuccess, ReferenceTablesApiActions.labTableChosenSuccess, (state, { list }): ReferenceTablesState => ({
      ...state, loading: false, tables: list.tables, labTableId: list.labTableId,
      current: state.current && { ...state.current, usedByLab: list.labTableId === state.current.id },
    })),
    on(ReferenceTablesApiActions.listLoadedFailure, ReferenceTablesApiActions.tableLoadedFailure, (state, { message }): ReferenceTablesState => ({ ...state, loading: false, loadError: message })),
    on(ReferenceTablesPageActions.uploadSubmitted, (state): ReferenceTablesState => ({ ...state, uploading: true, uploadProblems: null, uploadError: null })),
    on(ReferenceTablesApiActions.tableUploadedSuccess, (state, { table }): ReferenceTablesState => ({ ...state, uploading: false, current: table })),
    on(ReferenceTablesApiActions.tableUploadedFailure, (state, { message, fields }): ReferenceTablesState => ({ ...state, uploading: false, uploadError: message, uploadProblems: fields })),
    on(ReferenceTablesApiActions.tableLoadedSuccess, (state, { table }): ReferenceTablesState => ({ ...state, loading: false, current: table })),
    on(ReferenceTablePageActions.rowCorrected, (state): ReferenceTablesState => ({ ...state, correcting: true })),
    on(ReferenceTablesApiActions.rowCorrectedSuccess, (state, { table }): ReferenceTablesState => ({ ...state, correcting: false, current: table, correctedCount: state.correctedCount + 1 })),
    on(ReferenceTablesApiActions.rowCorrectedFailure, (state): ReferenceTablesState => ({ ...state, correcting: false })),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (): ReferenceTablesState => initialReferenceTablesState),
  ),
});
