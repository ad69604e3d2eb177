import { inject } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { Store } from '@ngrx/store';
import { catchError, exhaustMap, filter, map, of, switchMap, take, tap, withLatestFrom } from 'rxjs';
import { BatchPageActions } from '@app/batches/state/batch-page.actions';
import { BatchesApiActions } from '@app/batches/state/batches-api.actions';
import { apiErrorMessage } from '@app/core/api-error-message';
import { DrawDialog } from '../draw-dialog/draw-dialog';
import { StockClient } from '../stock-client';
import { DrawDialogActions } from './draw-dialog.actions';
import { StockApiActions } from './stock-api.actions';
import { loadUnitsOn } from './load-units';
import { selectMayKeepStock } from './stock.selectors';

/** Starting a batch (moving it to brewing) offers brewers and admins to draw its bill from stock. */
export const offerDrawOnBrewing = createEffect(
  (actions$ = inject(Actions), store = inject(Store)) =>
    actions$.pipe(
      ofType(BatchPageActions.statusMoveChosen, BatchPageActions.skipConfirmed),
      filter((action) => action.status === 'brewing' && (action.type === BatchPageActions.skipConfirmed.type || action.skipped.length === 0)),
      switchMap(() => actions$.pipe(ofType(BatchesApiActions.batchChangedSuccess, BatchesApiActions.batchChangedFailure), take(1))),
      filter((result) => result.type === BatchesApiActions.batchChangedSuccess.type && result.batch.status === 'brewing' && result.batch.recipeId !== null),
      withLatestFrom(store.select(selectMayKeepStock)),
      filter(([, mayKeep]) => mayKeep),
      map(([result]) => DrawDialogActions.drawOffered({ batchId: (result as ReturnType<typeof BatchesApiActions.batchChangedSuccess>).batch.id })),
    ),
  { functional: true },
);

export const openDrawDialog = createEffect(
  (actions$ = inject(Actions), dialog = inject(MatDialog)) =>
    actions$.pipe(
      ofType(DrawDialogActions.drawOffered),
      tap(({ batchId }) => dialog.open(DrawDialog, { data: { batchId }, maxWidth: '640px', width: 'calc(100vw - 32px)' })),
    ),
  { functional: true, dispatch: false },
);

export const loadDrawPreview = createEffect(
  (actions$ = inject(Actions), client = inject(StockClient)) =>
    actions$.pipe(
      ofType(DrawDialogActions.drawOffered),
      switchMap(({ batchId }) =>
        client.drawPreview(batchId).pipe(
          map((preview) => StockApiActions.drawPreviewLoadedSuccess({ preview })),
          catchError((error: unknown) => of(StockApiActions.drawPreviewLoadedFailure({ message: apiErrorMessage(error, 'The bill could not be worked out.') }))),
        ),
      ),
    ),
  { functional: true },
);

/** A refused draw (stock changed meanwhile) shows the refusal beside a fresh preview. */
export const makeDraw = createEffect(
  (actions$ = inject(Actions), client = inject(StockClient)) =>
    actions$.pipe(
      ofType(DrawDialogActions.drawConfirmed),
      exhaustMap(({ batchId, acceptShortfall }) =>
        client.draw(batchId, acceptShortfall).pipe(
          map((draw) => StockApiActions.drawMadeSuccess({ draw })),
          catchError((error: unknown) => {
            const message = apiErrorMessage(error, 'The bill could not be drawn.');
            return client.drawPreview(batchId).pipe(
              map((preview) => StockApiActions.drawMadeFailure({ message, preview })),
              catchError(() => of(StockApiActions.drawMadeFailure({ message, preview: null }))),
            );
          }),
        ),
      ),
    ),
  { functional: true },
);

export const loadUnitsForDraw = loadUnitsOn(DrawDialogActions.drawOffered);
