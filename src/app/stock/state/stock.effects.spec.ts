import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { firstValueFrom, of, throwError } from 'rxjs';
import { Store } from '@ngrx/store';
import { StockClient } from '../stock-client';
import { ShoppingListPageActions } from './shopping-list-page.actions';
import { loadShoppingList } from './stock.effects';
import { StockApiActions } from './stock-api.actions';

describe('stock effects', () => {
  const coopIn = (zone: string) => ({ select: () => of(zone) }) as unknown as Store;

  afterEach(() => jest.useRealTimers());

  it('loadShoppingList opens on the co-op calendar: at 20:30 UTC on 2 Dec an Auckland co-op asks from 3 Dec', async () => {
    // 20:30 UTC is 09:30 the next day in Pacific/Auckland (UTC+13 in December).
    jest.useFakeTimers({ now: new Date('2026-12-02T20:30:00Z'), doNotFake: ['queueMicrotask', 'nextTick'] });
    const client = { shoppingList: jest.fn(() => throwError(() => new Error('offline'))) } as unknown as StockClient;
    await firstValueFrom(loadShoppingList(new Actions(of(ShoppingListPageActions.opened())), client, coopIn('Pacific/Auckland')));
    expect(client.shoppingList).toHaveBeenCalledWith('2026-12-03', expect.stringMatching(/^2026-12-\d\d$|^2027-/));
  });

  it('loadShoppingList names the horizon field the server refused and why', async () => {
    const refusal = new HttpErrorResponse({
      status: 400,
      error: { error: { code: 'validation-failed', message: 'Please check these fields: to.' }, fields: { to: 'must not be before from' } },
    });
    const client = { shoppingList: jest.fn(() => throwError(() => refusal)) } as unknown as StockClient;

    const action = await firstValueFrom(loadShoppingList(new Actions(of(ShoppingListPageActions.horizonChanged({ from: '2026-12-30', to: '2026-12-01' }))), client, coopIn('Europe/Berlin')));

    expect(action).toEqual(StockApiActions.shoppingListLoadedFailure({ message: 'To: must not be before from.' }));
  });
});
