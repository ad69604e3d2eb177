import { createEntityAdapter, EntityState } from '@ngrx/entity';
import { createFeature, createReducer, on } from '@ngrx/store';
import { Batch, BatchSummary, BrewerChoice, FermenterChoice } from '@shared/batches';
import { RecipeSummary, RecipeVersionSummary } from '@shared/recipes';
import { BatchListPageActions } from './batch-list-page.actions';
import { BatchPageActions } from './batch-page.actions';
import { BatchStartPageActions } from './batch-start-page.actions';
import { BatchesApiActions } from './batches-api.actions';
import { TodayPageActions } from '@app/today/state/today-page.actions';

export interface BatchesState extends EntityState<BatchSummary> {
  mine: boolean;
  listLoading: boolean;
  listError: string | null;
  current: Batch | null;
  currentLoading: boolean;
  currentError: string | null;
  saving: boolean;
  /** Reasons per field from the server's last refusal of a form on these pages. */
  fieldErrors: Record<string, string> | null;
  recipes: RecipeSummary[];
  fermenters: FermenterChoice[];
  /** Whom an editor may name as the batch's brewer. */
  brewers: BrewerChoice[];
  versions: RecipeVersionSummary[];
}

export const batchesAdapter = createEntityAdapter<BatchSummary>({
  sortComparer: (a, b) => b.brewDate.localeCompare(a.brewDate) || b.id - a.id,
});

export const initialBatchesState: BatchesState = batchesAdapter.getInitialState({
  mine: false,
  listLoading: false,
  listError: null,
  current: null,
  currentLoading: false,
  currentError: null,
  saving: false,
  fieldErrors: null,
  recipes: [],
  fermenters: [],
  brewers: [],
  versions: [],
});

export const batchesFeature = createFeature({
  name: 'batches',
  reducer: createReducer(
    initialBatchesState,
    on(BatchListPageActions.opened, BatchListPageActions.scopeChanged, (state, { mine }): BatchesState => ({ ...state, mine, listLoading: true, listError: null })),
    on(TodayPageActions.opened, (state): BatchesState => ({ ...state, mine: true, listLoading: true, listError: null })),
    on(BatchesApiActions.batchesLoadedSuccess, (state, { batches }): BatchesState => batchesAdapter.setAll(batches, { ...state, listLoading: false })),
    on(BatchesApiActions.batchesLoadedFailure, (state, { message }): BatchesState => ({ ...state, listLoading: false, listError: message })),
    on(BatchPageActions.opened, (state, { batchId }): BatchesState => ({
      ...state, current: state.current?.id === batchId ? state.current : null, currentLoading: true, currentError: null, fieldErrors: null,
    })),
    on(BatchesApiActions.batchLoadedSuccess, (state, { batch }): BatchesState => ({ ...state, current: batch, currentLoading: false })),
    on(BatchesApiActions.batchLoadedFailure, (state, { message }): BatchesState => ({ ...state, currentLoading: false, currentError: message })),
    on(BatchStartPageActions.opened, (state): BatchesState => ({ ...state, versions: [], fieldErrors: null, saving: false })),
    on(BatchesApiActions.startChoicesLoadedSuccess, (state, { recipes, fermenters }): BatchesState => ({ ...state, recipes, fermenters })),
    on(BatchesApiActions.editChoicesLoadedSuccess, (state, { brewers, fermenters }): BatchesState => ({ ...state, brewers, fermenters })),
    on(BatchStartPageActions.recipeChosen, (state): BatchesState => ({ ...state, versions: [] })),
    on(BatchesApiActions.versionsLoadedSuccess, (state, { versions }): BatchesState => ({ ...state, versions })),
    on(BatchStartPageActions.startSubmitted, BatchPageActions.skipConfirmed, BatchPageActions.brewDaySubmitted, BatchPageActions.detailsSubmitted, (state): BatchesState => ({ ...state, saving: true, fieldErrors: null })),
    on(BatchPageActions.statusMoveChosen, (state, { skipped }): BatchesState => (skipped.length ? state : { ...state, saving: true, fieldErrors: null })),
    on(BatchesApiActions.batchStartedSuccess, (state, { batch }): BatchesState => ({ ...state, saving: false, current: batch })),
    on(BatchesApiActions.batchChangedSuccess, (state, { batch }): BatchesState => ({ ...state, saving: false, current: batch })),
    on(BatchesApiActions.batchStartedFailure, BatchesApiActions.batchChangedFailure, (state, { fields }): BatchesState => ({ ...state, saving: false, fieldErrors: fields })),
  ),
  extraSelectors: ({ selectBatchesState }) => ({ ...batchesAdapter.getSelectors(selectBatchesState) }),
});
