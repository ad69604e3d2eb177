import { createFeature, createReducer, on } from '@ngrx/store';
import { ProductionReport } from '@shared/production-report';
import { ProductionReportApiActions } from './production-report-api.actions';
import { ProductionReportPageActions } from './production-report-page.actions';

export interface ProductionReportState {
  report: ProductionReport | null;
  loading: boolean;
  loadError: string | null;
}

export const initialProductionReportState: ProductionReportState = { report: null, loading: false, loadError: null };

export const productionReportFeature = createFeature({
  name: 'productionReport',
  reducer: createReducer(
    initialProductionReportState,
    on(ProductionReportPageActions.opened, ProductionReportPageActions.rangeChanged, (state): ProductionReportState => ({ ...state, loading: true, loadError: null })),
    on(ProductionReportApiActions.reportLoadedSuccess, (state, { report }): ProductionReportState => ({ ...state, report, loading: false })),
    on(ProductionReportApiActions.reportLoadedFailure, (state, { message }): ProductionReportState => ({ ...state, loading: false, loadError: message })),
  ),
});
