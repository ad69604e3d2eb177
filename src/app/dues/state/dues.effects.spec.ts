import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { Action } from '@ngrx/store';
import { firstValueFrom, Observable, of, throwError } from 'rxjs';
import { generateMockOverview } from '@app/testing/dues-mock';
import { DuesClient } from '../dues-client';
import { DuesApiActions } from './dues-api.actions';
import { DuesLedgerPageActions } from './dues-ledger-page.actions';
import { DuesPageActions } from './dues-page.actions';
import { changeLedger, payDues } from './dues.effects';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const fakeClient = (overrides: Partial<Record<keyof DuesClient, (...args: never[]) => Observable<unknown>>>) => overrides as unknown as DuesClient;
const request = { planId: 1, cardToken: 'tok_visa', saveCardForRenewal: true, idempotencyKey: 'a'.repeat(32) };

describe('dues effects', () => {
  it('payDues sends the request and maps the answer to Payment Made Success', async () => {
    const overview = generateMockOverview();
    const pay = jest.fn(() => of(overview));

    const result = await firstValueFrom(payDues(actionsOf(DuesPageActions.paymentSubmitted({ request })), fakeClient({ pay })));

    expect(pay).toHaveBeenCalledWith(request);
    expect(result).toEqual(DuesApiActions.paymentMadeSuccess({ overview }));
  });

  it('payDues passes on the server words of a declined card (402)', async () => {
    const refusal = new HttpErrorResponse({ status: 402, error: { error: { code: 'card-declined', message: 'The card was declined (Your card was declined). Nothing was charged.' } } });

    const result = await firstValueFrom(payDues(actionsOf(DuesPageActions.paymentSubmitted({ request })), fakeClient({ pay: () => throwError(() => refusal) })));

    expect(result).toEqual(DuesApiActions.paymentMadeFailure({ message: 'The card was declined (Your card was declined). Nothing was charged.' }));
  });

  it('changeLedger refunds and reports the notice', async () => {
    const ledger = { members: [], payments: [], plans: [] };
    const refund = jest.fn(() => of(ledger));

    const result = await firstValueFrom(changeLedger(actionsOf(DuesLedgerPageActions.refundConfirmed({ paymentId: 7 })), fakeClient({ refund })));

    expect(refund).toHaveBeenCalledWith(7);
    expect(result).toEqual(DuesApiActions.ledgerChangedSuccess({ ledger, notice: 'Payment refunded.' }));
  });

  it('changeLedger passes on field reasons of a refused plan', async () => {
    const refusal = new HttpErrorResponse({ status: 409, error: { error: { code: 'plan-name-taken', message: 'A plan with this name exists already.' }, fields: { name: 'is taken' } } });

    const result = await firstValueFrom(
      changeLedger(actionsOf(DuesLedgerPageActions.planSubmitted({ request: { name: 'Standard', amountCents: 1200, currency: 'EUR', period: 'month' } })), fakeClient({ createPlan: () => throwError(() => refusal) })),
    );

    expect(result).toEqual(DuesApiActions.ledgerChangedFailure({ message: 'A plan with this name exists already.', fields: { name: 'is taken' } }));
  });
});
