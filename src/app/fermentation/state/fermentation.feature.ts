import { createFeature, createReducer, on } from '@ngrx/store';
import { FermentationChartData } from '@shared/fermentation';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { FermentationApiActions } from './fermentation-api.actions';
import { FermentationPageActions } from './fermentation-page.actions';

export interface FermentationState {
  chart: FermentationChartData | null;
  loading: boolean;
  error: string | null;
}

export const initialFermentationState: FermentationState = { chart: null, loading: false, error: null };

export const fermentationFeature = createFeature({
  name: 'fermentation',
  reducer: createReducer(
    initialFermentationState,
    on(FermentationPageActions.opened, (state, { batchId }): FermentationState => ({ ...state, loading: true, error: null, chart: state.chart?.batchId === batchId ? state.chart : null })),
    on(FermentationApiActions.chartLoadedSuccess, (state, { chart }): FermentationState => ({ ...state, loading: false, chart })),
    on(FermentationApiActions.chartLoadedFailure, (state, { message }): FermentationState => ({ ...state, loading: false, error: message })),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (): FermentationState => initialFermentationState),
  ),
});
