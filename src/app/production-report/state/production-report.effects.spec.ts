import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { Action } from '@ngrx/store';
import { firstValueFrom, of, throwError } from 'rxjs';
import { generateMockProductionReport } from '@app/testing/production-report-mock';
import { ProductionReportClient } from '../production-report-client';
import { ProductionReportApiActions } from './production-report-api.actions';
import { ProductionReportPageActions } from './production-report-page.actions';
import { loadReport } from './production-report.effects';
import { initialProductionReportState, productionReportFeature } from './production-report.feature';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));

describe('production report state', () => {
  it('loadReport asks for the months of the page and maps the answer to Report Loaded Success', async () => {
    const report = generateMockProductionReport();
    const client = { report: jest.fn(() => of(report)) } as unknown as ProductionReportClient;

    const result = await firstValueFrom(loadReport(actionsOf(ProductionReportPageActions.rangeChanged({ from: '2026-10', to: '2026-11' })), client));

    expect(client.report).toHaveBeenCalledWith('2026-10', '2026-11');
    expect(result).toEqual(ProductionReportApiActions.reportLoadedSuccess({ report }));
  });

  it('loadReport passes on the server’s words when it refuses', async () => {
    const refusal = new HttpErrorResponse({ status: 400, error: { error: { code: 'validation-failed', message: 'Please check these fields: to.' } } });
    const client = { report: () => throwError(() => refusal) } as unknown as ProductionReportClient;

    const result = await firstValueFrom(loadReport(actionsOf(ProductionReportPageActions.opened({ from: '2026-10', to: '2026-11' })), client));

    expect(result).toEqual(ProductionReportApiActions.reportLoadedFailure({ message: 'Please check these fields: to.' }));
  });

  it('the reducer keeps the last report while a new range loads, and the error when it fails', () => {
    const report = generateMockProductionReport();
    const { reducer } = productionReportFeature;
    const loaded = reducer(initialProductionReportState, ProductionReportApiActions.reportLoadedSuccess({ report }));
    const loading = reducer(loaded, ProductionReportPageActions.rangeChanged({ from: '2026-06', to: '2026-11' }));
    const failed = reducer(loading, ProductionReportApiActions.reportLoadedFailure({ message: 'down' }));

    expect(loading).toEqual({ report, loading: true, loadError: null });
    expect(failed).toEqual({ report, loading: false, loadError: 'down' });
  });
});
