import { createFeature, createReducer, on } from '@ngrx/store';
import { BatchSummary } from '@shared/batches';
import { BatchStrengthCheck, SignOffRequest, StrengthRecord } from '@shared/strength-check';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { BatchStrengthApiActions } from './batch-strength-api.actions';
import { BatchStrengthPageActions } from './batch-strength-page.actions';
import { StrengthCheckPageActions } from './strength-check-page.actions';
import { StrengthRecordPageActions } from './strength-record-page.actions';

export interface BatchStrengthState {
  batches: BatchSummary[];
  check: BatchStrengthCheck | null;
  /** The declared strength and class last checked, kept so a reload after a lab analysis keeps the verdict. */
  declared: SignOffRequest | null;
  record: StrengthRecord | null;
  loading: boolean;
  error: string | null;
  signing: boolean;
  analysing: boolean;
  analysisError: string | null;
  analysisFields: Record<string, string> | null;
  /** Counts recorded analyses so the lab form can clear after each one. */
  analysedCount: number;
}

export const initialBatchStrengthState: BatchStrengthState = {
  batches: [], check: null, declared: null, record: null, loading: false, error: null, signing: false, analysing: false, analysisError: null, analysisFields: null, analysedCount: 0,
};

export const batchStrengthFeature = createFeature({
  name: 'batchStrength',
  reducer: createReducer(
    initialBatchStrengthState,
    on(StrengthCheckPageActions.opened, (state): BatchStrengthState => ({ ...state, error: null })),
    on(BatchStrengthApiActions.batchesLoadedSuccess, (state, { batches }): BatchStrengthState => ({ ...state, batches })),
    on(BatchStrengthPageActions.opened, (state, { batchId }): BatchStrengthState => ({
      ...state, loading: true, error: null, check: state.check?.batchId === batchId ? state.check : null, declared: state.check?.batchId === batchId ? state.declared : null,
    })),
    on(BatchStrengthPageActions.declaredStrengthChecked, (state): BatchStrengthState => ({ ...state, loading: true })),
    on(BatchStrengthApiActions.checkLoadedSuccess, (state, { check, declared }): BatchStrengthState => ({ ...state, loading: false, check, declared })),
    on(BatchStrengthApiActions.checkLoadedFailure, BatchStrengthApiActions.recordLoadedFailure, (state, { message }): BatchStrengthState => ({ ...state, loading: false, error: message })),
    on(BatchStrengthPageActions.signOffRequested, (state): BatchStrengthState => ({ ...state, signing: true })),
    on(BatchStrengthApiActions.signedOffSuccess, (state, { record }): BatchStrengthState => ({ ...state, signing: false, record })),
    on(BatchStrengthApiActions.signedOffFailure, (state): BatchStrengthState => ({ ...state, signing: false })),
    on(StrengthRecordPageActions.opened, (state, { signOffId }): BatchStrengthState => ({ ...state, loading: true, error: null, record: state.record?.id === signOffId ? state.record : null })),
    on(BatchStrengthApiActions.recordLoadedSuccess, (state, { record }): BatchStrengthState => ({ ...state, loading: false, record })),
    on(BatchStrengthPageActions.distillateAnalysed, (state): BatchStrengthState => ({ ...state, analysing: true, analysisError: null, analysisFields: null })),
    on(BatchStrengthApiActions.analysisRecordedSuccess, (state): BatchStrengthState => ({ ...state, analysing: false, analysedCount: state.analysedCount + 1 })),
    on(BatchStrengthApiActions.analysisRecordedFailure, (state, { message, fields }): BatchStrengthState => ({ ...state, analysing: false, analysisError: message, analysisFields: fields })),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (): BatchStrengthState => initialBatchStrengthState),
  ),
});
