import { inject } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { Store } from '@ngrx/store';
import { catchError, EMPTY, exhaustMap, filter, map, of, switchMap, withLatestFrom } from 'rxjs';
import { AdjustLotRequest, ReceiveLotRequest, ReorderLevelRequest } from '@shared/stock';
import { apiErrorMessage } from '@app/core/api-error-message';
import { authFeature } from '@app/auth/state/auth.feature';
import { AdjustLotDialog, AdjustLotDialogData } from '../adjust-lot-dialog/adjust-lot-dialog';
import { ReceiveLotDialog, ReceiveLotDialogData } from '../receive-lot-dialog/receive-lot-dialog';
import { ReorderLevelDialog } from '../reorder-level-dialog/reorder-level-dialog';
import { LotHistoryDialog, LotHistoryDialogData } from '../lot-history-dialog/lot-history-dialog';
import { StockClient } from '../stock-client';
import { coopToday } from '../coop-today';
import { StockApiActions } from './stock-api.actions';
import { StockDialogsActions } from './stock-dialogs.actions';
import { stockFeature } from './stock.feature';
import { StockPageActions } from './stock-page.actions';

const DIALOG = { maxWidth: '560px', width: 'calc(100vw - 32px)' };
const failed = (fallback: string) => (error: unknown) => of(StockApiActions.stockChangeFailure({ message: apiErrorMessage(error, fallback) }));

export const openReceiveLot = createEffect(
  (actions$ = inject(Actions), dialog = inject(MatDialog), store = inject(Store)) =>
    actions$.pipe(
      ofType(StockPageActions.receiveLotClicked),
      withLatestFrom(store.select(stockFeature.selectIngredients), store.select(stockFeature.selectUnitSystem), store.select(authFeature.selectCoopTimeZone)),
      exhaustMap(([, ingredients, unitSystem, zone]) =>
        dialog.open<ReceiveLotDialog, ReceiveLotDialogData, ReceiveLotRequest>(ReceiveLotDialog, { ...DIALOG, data: { ingredients, unitSystem, today: coopToday(zone) } }).afterClosed(),
      ),
      filter((request): request is ReceiveLotRequest => !!request),
      map((request) => StockDialogsActions.receiveLotSubmitted({ request })),
    ),
  { functional: true },
);

export const openAdjustLot = createEffect(
  (actions$ = inject(Actions), dialog = inject(MatDialog), store = inject(Store)) =>
    actions$.pipe(
      ofType(StockPageActions.adjustLotClicked),
      withLatestFrom(store.select(stockFeature.selectUnitSystem)),
      exhaustMap(([{ lot }, unitSystem]) =>
        dialog
          .open<AdjustLotDialog, AdjustLotDialogData, AdjustLotRequest>(AdjustLotDialog, { ...DIALOG, data: { lot, unitSystem } })
          .afterClosed()
          .pipe(filter((request): request is AdjustLotRequest => !!request), map((request) => StockDialogsActions.adjustmentSubmitted({ lotId: lot.id, request }))),
      ),
    ),
  { functional: true },
);

export const openReorderLevel = createEffect(
  (actions$ = inject(Actions), dialog = inject(MatDialog), store = inject(Store)) =>
    actions$.pipe(
      ofType(StockPageActions.reorderLevelClicked),
      withLatestFrom(store.select(stockFeature.selectUnitSystem)),
      exhaustMap(([{ lot }, unitSystem]) =>
        dialog
          .open<ReorderLevelDialog, AdjustLotDialogData, ReorderLevelRequest>(ReorderLevelDialog, { ...DIALOG, data: { lot, unitSystem } })
          .afterClosed()
          .pipe(filter((request): request is ReorderLevelRequest => !!request), map((request) => StockDialogsActions.reorderLevelSubmitted({ ingredientId: lot.ingredientId, request }))),
      ),
    ),
  { functional: true },
);

export const receiveLot = createEffect(
  (actions$ = inject(Actions), client = inject(StockClient)) =>
    actions$.pipe(
      ofType(StockDialogsActions.receiveLotSubmitted),
      exhaustMap(({ request }) =>
        client.receive(request).pipe(map((lot) => StockApiActions.lotSavedSuccess({ lot, message: `Received ${lot.ingredientName}.` })), catchError(failed('The lot could not be received.'))),
      ),
    ),
  { functional: true },
);

export const adjustLot = createEffect(
  (actions$ = inject(Actions), client = inject(StockClient)) =>
    actions$.pipe(
      ofType(StockDialogsActions.adjustmentSubmitted),
      exhaustMap(({ lotId, request }) =>
        client.adjust(lotId, request).pipe(map((lot) => StockApiActions.lotSavedSuccess({ lot, message: `Adjusted ${lot.ingredientName}.` })), catchError(failed('The adjustment could not be recorded.'))),
      ),
    ),
  { functional: true },
);

export const saveReorderLevel = createEffect(
  (actions$ = inject(Actions), client = inject(StockClient)) =>
    actions$.pipe(
      ofType(StockDialogsActions.reorderLevelSubmitted),
      exhaustMap(({ ingredientId, request }) =>
        client.setReorderLevel(ingredientId, request).pipe(
          map(() => StockApiActions.reorderLevelSavedSuccess({ message: request.level === null ? 'Reorder level cleared.' : 'Reorder level saved.' })),
          catchError(failed('The reorder level could not be saved.')),
        ),
      ),
    ),
  { functional: true },
);

/** Loads a lot's movements and shows them; a failure is told in the snack bar. */
export const showLotHistory = createEffect(
  (actions$ = inject(Actions), dialog = inject(MatDialog), client = inject(StockClient), store = inject(Store)) =>
    actions$.pipe(
      ofType(StockPageActions.historyClicked),
      withLatestFrom(store.select(stockFeature.selectUnitSystem), store.select(authFeature.selectCoopTimeZone)),
      exhaustMap(([{ lot }, unitSystem, timeZone]) =>
        client.movements(lot.id).pipe(
          switchMap((movements) => {
            dialog.open<LotHistoryDialog, LotHistoryDialogData>(LotHistoryDialog, { ...DIALOG, data: { lot, movements, unitSystem, timeZone } });
            return EMPTY;
          }),
          catchError(failed('The lot’s history could not be loaded.')),
        ),
      ),
    ),
  { functional: true },
);
