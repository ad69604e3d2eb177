import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { firstValueFrom, of, throwError } from 'rxjs';
import { StockClient } from '../stock-client';
import { ShoppingListPageActions } from './shopping-list-page.actions';
import { loadShoppingList } from './stock.effects';
import { StockApiActions } from './stock-api.actions';

describe('stock effects', () => {
  it('loadShoppingList names the horizon field the server refused and why', async () => {
    const refusal = new HttpErrorResponse({
      status: 400,
      error: { error: { code: 'validation-failed', message: 'Please check these fields: to.' }, fields: { to: 'must not be before from' } },
    });
    const client = { shoppingList: jest.fn(() => throwError(() => refusal)) } as unknown as StockClient;

    const action = await firstValueFrom(loadShoppingList(new Actions(of(ShoppingListPageActions.horizonChanged({ from: '2026-12-30', to: '2026-12-01' }))), client));

    expect(action).toEqual(StockApiActions.shoppingListLoadedFailure({ message: 'To: must not be before from.' }));
  });
});
