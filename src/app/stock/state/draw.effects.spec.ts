import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { Action, Store } from '@ngrx/store';
import { firstValueFrom, of, throwError, toArray } from 'rxjs';
import { Batch } from '@shared/batches';
import { DrawPreview } from '@shared/stock';
import { BatchPageActions } from '@app/batches/state/batch-page.actions';
import { BatchesApiActions } from '@app/batches/state/batches-api.actions';
import { StockClient } from '../stock-client';
import { DrawDialogActions } from './draw-dialog.actions';
import { makeDraw, offerDrawOnBrewing } from './draw.effects';
import { StockApiActions } from './stock-api.actions';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const storeWith = (value: unknown) => ({ select: () => of(value) }) as unknown as Store;
const brewing = { id: 5, name: 'Test batch', status: 'brewing', recipeId: 3 } as Batch;

describe('draw effects', () => {
  it('offerDrawOnBrewing offers the draw once a batch with a recipe has moved to brewing', async () => {
    const moved = [BatchPageActions.statusMoveChosen({ batchId: 5, status: 'brewing', skipped: [], at: null }), BatchesApiActions.batchChangedSuccess({ batch: brewing, message: '' })];

    const offered = await firstValueFrom(offerDrawOnBrewing(actionsOf(...moved), storeWith(true)));

    expect(offered).toEqual(DrawDialogActions.drawOffered({ batchId: 5 }));
  });

  it('offerDrawOnBrewing offers nothing to a member, for a refused move or for a batch without a recipe', async () => {
    const chosen = BatchPageActions.statusMoveChosen({ batchId: 5, status: 'brewing', skipped: [], at: null });
    const runs = [
      offerDrawOnBrewing(actionsOf(chosen, BatchesApiActions.batchChangedSuccess({ batch: brewing, message: '' })), storeWith(false)),
      offerDrawOnBrewing(actionsOf(chosen, BatchesApiActions.batchChangedFailure({ message: 'No.', fields: null })), storeWith(true)),
      offerDrawOnBrewing(actionsOf(chosen, BatchesApiActions.batchChangedSuccess({ batch: { ...brewing, recipeId: null }, message: '' })), storeWith(true)),
    ];

    for (const run of runs) expect(await firstValueFrom(run.pipe(toArray()))).toEqual([]);
  });

  it('makeDraw shows a refusal beside a fresh preview', async () => {
    const preview: DrawPreview = { batchId: 5, batchName: 'Test batch', blockedReason: null, lines: [], drawn: null };
    const refusal = new HttpErrorResponse({ status: 409, error: { error: { code: 'stock-shortfall', message: 'Stock is short of malt.' } } });
    const client = { draw: jest.fn(() => throwError(() => refusal)), drawPreview: jest.fn(() => of(preview)) } as unknown as StockClient;

    const action = await firstValueFrom(makeDraw(actionsOf(DrawDialogActions.drawConfirmed({ batchId: 5, acceptShortfall: false })), client));

    expect(client.draw).toHaveBeenCalledWith(5, false);
    expect(action).toEqual(StockApiActions.drawMadeFailure({ message: 'Stock is short of malt.', preview }));
  });
});
