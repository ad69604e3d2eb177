import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { Action } from '@ngrx/store';
import { firstValueFrom, of, throwError } from 'rxjs';
import { BatchStrengthClient } from '../batch-strength-client';
import { BatchStrengthApiActions } from './batch-strength-api.actions';
import { BatchStrengthPageActions } from './batch-strength-page.actions';
import { signOff } from './batch-strength.effects';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const request = { declaredPercentVolume: 5.1, toleranceClassId: 2 };

describe('batch strength effects', () => {
  it('signOff posts the declared strength of the batch and takes the record', async () => {
    const record = { id: 8, batchId: 4 } as never;
    const client = { signOff: jest.fn(() => of(record)) } as unknown as BatchStrengthClient;

    const action = await firstValueFrom(signOff(actionsOf(BatchStrengthPageActions.signOffRequested({ batchId: 4, request })), client));

    expect(client.signOff).toHaveBeenCalledWith(4, request);
    expect(action).toEqual(BatchStrengthApiActions.signedOffSuccess({ record }));
  });

  it('signOff turns a 403 into a failure with the server reason', async () => {
    const error = new HttpErrorResponse({ status: 403, error: { error: { code: 'forbidden', message: 'Your roles do not allow this.' } } });
    const client = { signOff: jest.fn(() => throwError(() => error)) } as unknown as BatchStrengthClient;

    const action = await firstValueFrom(signOff(actionsOf(BatchStrengthPageActions.signOffRequested({ batchId: 4, request })), client));

    expect(action).toEqual(BatchStrengthApiActions.signedOffFailure({ message: 'Your roles do not allow this.' }));
  });
});
