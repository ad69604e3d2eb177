import { createEntityAdapter, EntityState } from '@ngrx/entity';
import { createFeature, createReducer, on } from '@ngrx/store';
import { Batch } from '@shared/batches';
import { GravityReading, IssuedPushToken, PushTokenSummary, ReadingImportResult, ReadingSortColumn } from '@shared/readings';
import { GravityLogPageActions } from './gravity-log-page.actions';
import { ReadingsApiActions } from './readings-api.actions';

/** An upload on its way: percent sent, then the server's answer. */
export interface ImportState {
  busy: boolean;
  percent: number;
  result: ReadingImportResult | null;
  error: string | null;
}

export interface ReadingsState extends EntityState<GravityReading> {
  batchId: number | null;
  batch: Batch | null;
  batchError: string | null;
  total: number;
  pageIndex: number;
  pageSize: number;
  sort: ReadingSortColumn;
  direction: 'asc' | 'desc';
  loading: boolean;
  error: string | null;
  saving: boolean;
  fieldErrors: Record<string, string> | null;
  /** Goes up after each stored reading, so the entry form clears for the next one. */
  savedRevision: number;
  import: ImportState;
  pushTokens: PushTokenSummary[];
  /** A token just made: shown once, gone when the page is left. */
  issuedToken: IssuedPushToken | null;
}

/** Readings keep the server's page order (sorted there), so the adapter does not sort. */
export const readingsAdapter = createEntityAdapter<GravityReading>();

const idleImport: ImportState = { busy: false, percent: 0, result: null, error: null };

export const initialReadingsState: ReadingsState = readingsAdapter.getInitialState({
  batchId: null, batch: null, batchError: null, total: 0, pageIndex: 0, pageSize: 25, sort: 'measuredAt', direction: 'desc', loading: false, error: null,
  saving: false, fieldErrors: null, savedRevision: 0, import: idleImport, pushTokens: [], issuedToken: null,
});

export const readingsFeature = createFeature({
  name: 'readings',
  reducer: createReducer(
    initialReadingsState,
    on(GravityLogPageActions.opened, (state, { batchId }): ReadingsState =>
      state.batchId === batchId ? { ...state, loading: true, issuedToken: null } : { ...initialReadingsState, batchId, loading: true }),
    on(ReadingsApiActions.batchLoadedSuccess, ReadingsApiActions.correctionFactorSetSuccess, (state, { batch }): ReadingsState => ({ ...state, batch })),
    on(ReadingsApiActions.batchLoadedFailure, (state, { message }): ReadingsState => ({ ...state, batchError: message })),
    on(GravityLogPageActions.pageChanged, (state, { pageIndex, pageSize }): ReadingsState => ({ ...state, pageIndex, pageSize, loading: true })),
    on(GravityLogPageActions.sortChanged, (state, { sort, direction }): ReadingsState => ({ ...state, sort, direction, pageIndex: 0, loading: true })),
    on(ReadingsApiActions.readingsLoadedSuccess, (state, { page }): ReadingsState => readingsAdapter.setAll(page.items, { ...state, total: page.total, loading: false, error: null })),
    on(ReadingsApiActions.readingsLoadedFailure, (state, { message }): ReadingsState => ({ ...state, loading: false, error: message })),
    on(GravityLogPageActions.readingSubmitted, (state): ReadingsState => ({ ...state, saving: true, fieldErrors: null })),
    on(ReadingsApiActions.readingAddedSuccess, (state): ReadingsState => ({ ...state, saving: false, savedRevision: state.savedRevision + 1 })),
    on(ReadingsApiActions.readingAddedFailure, (state, { fields }): ReadingsState => ({ ...state, saving: false, fieldErrors: fields })),
    on(ReadingsApiActions.readingEditedSuccess, (state, { reading }): ReadingsState => readingsAdapter.setOne(reading, state)),
    on(ReadingsApiActions.readingDeletedSuccess, (state, { readingId }): ReadingsState => readingsAdapter.removeOne(readingId, { ...state, total: state.total - 1 })),
    on(GravityLogPageActions.fileSubmitted, (state): ReadingsState => ({ ...state, import: { ...idleImport, busy: true } })),
    on(ReadingsApiActions.importProgressed, (state, { percent }): ReadingsState => ({ ...state, import: { ...state.import, percent } })),
    on(ReadingsApiActions.importFinished, (state, { result }): ReadingsState => ({ ...state, import: { ...idleImport, result, percent: 100 } })),
    on(ReadingsApiActions.importFailed, (state, { message }): ReadingsState => ({ ...state, import: { ...idleImport, error: message } })),
    on(ReadingsApiActions.pushTokensLoadedSuccess, (state, { tokens }): ReadingsState => ({ ...state, pushTokens: tokens })),
    on(ReadingsApiActions.pushTokenCreatedSuccess, (state, { token }): ReadingsState => {
      const { token: _secret, ...summary } = token;
      return { ...state, issuedToken: token, pushTokens: [summary, ...state.pushTokens] };
    }),
    on(ReadingsApiActions.pushTokenRevokedSuccess, (state, { tokenId }): ReadingsState => ({
      ...state,
      pushTokens: state.pushTokens.map((t) => (t.id === tokenId ? { ...t, revokedAt: new Date().toISOString() } : t)),
      issuedToken: state.issuedToken?.id === tokenId ? null : state.issuedToken,
    })),
  ),
  extraSelectors: ({ selectReadingsState }) => ({ ...readingsAdapter.getSelectors(selectReadingsState) }),
});
