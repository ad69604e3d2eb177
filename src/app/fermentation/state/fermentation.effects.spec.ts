import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { firstValueFrom, of, throwError } from 'rxjs';
import { FermentationClient } from '../fermentation-client';
import { FermentationApiActions } from './fermentation-api.actions';
import { FermentationPageActions } from './fermentation-page.actions';
import { loadChart } from './fermentation.effects';

describe('fermentation effects', () => {
  it('loadChart loads the chart of the opened batch', async () => {
    const chart = { batchId: 3 } as never;
    const client = { chart: jest.fn(() => of(chart)) } as unknown as FermentationClient;
    const action = await firstValueFrom(loadChart(new Actions(of(FermentationPageActions.opened({ batchId: 3 }))), client));
    expect(client.chart).toHaveBeenCalledWith(3);
    expect(action).toEqual(FermentationApiActions.chartLoadedSuccess({ chart }));
  });

  it('loadChart reports a missing batch in the server\'s words', async () => {
    const error = new HttpErrorResponse({ status: 404, error: { error: { code: 'batch-not-found', message: 'There is no batch with this id.' } } });
    const client = { chart: jest.fn(() => throwError(() => error)) } as unknown as FermentationClient;
    const action = await firstValueFrom(loadChart(new Actions(of(FermentationPageActions.opened({ batchId: 3 }))), client));
    expect(action).toEqual(FermentationApiActions.chartLoadedFailure({ message: 'There is no batch with this id.' }));
  });
});
