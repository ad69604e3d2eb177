import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, concatMap, exhaustMap, map, of, switchMap, tap } from 'rxjs';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { ReferenceTablesClient } from '../reference-tables-client';
import { ReferenceTablePageActions } from './reference-table-page.actions';
import { ReferenceTablesApiActions } from './reference-tables-api.actions';
import { ReferenceTablesPageActions } from './reference-tables-page.actions';

export const loadList = createEffect(
  (actions$ = inject(Actions), client = inject(ReferenceTablesClient)) =>
    actions$.pipe(
      ofType(ReferenceTablesPageActions.opened),
      switchMap(() =>
        client.list().pipe(
          map((list) => ReferenceTablesApiActions.listLoadedSuccess({ list })),
          catchError((error: unknown) => of(ReferenceTablesApiActions.listLoadedFailure({ message: apiErrorMessage(error, 'The tables could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const uploadTable = createEffect(
  (actions$ = inject(Actions), client = inject(ReferenceTablesClient)) =>
    actions$.pipe(
      ofType(ReferenceTablesPageActions.uploadSubmitted),
      exhaustMap(({ upload }) =>
        client.upload(upload).pipe(
          map((table) => ReferenceTablesApiActions.tableUploadedSuccess({ table })),
          catchError((error: unknown) =>
            of(ReferenceTablesApiActions.tableUploadedFailure({ message: apiErrorMessage(error, 'The table could not be uploaded.'), fields: apiFieldErrors(error) })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const openUploadedTable = createEffect(
  (actions$ = inject(Actions), router = inject(Router)) =>
    actions$.pipe(
      ofType(ReferenceTablesApiActions.tableUploadedSuccess),
      tap(({ table }) => void router.navigate(['/reference-tables', table.id])),
    ),
  { functional: true, dispatch: false },
);

export const loadTable = createEffect(
  (actions$ = inject(Actions), client = inject(ReferenceTablesClient)) =>
    actions$.pipe(
      ofType(ReferenceTablePageActions.opened),
      switchMap(({ tableId }) =>
        client.detail(tableId).pipe(
          map((table) => ReferenceTablesApiActions.tableLoadedSuccess({ table })),
          catchError((error: unknown) => of(ReferenceTablesApiActions.tableLoadedFailure({ message: apiErrorMessage(error, 'The table could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const correctRow = createEffect(
  (actions$ = inject(Actions), client = inject(ReferenceTablesClient)) =>
    actions$.pipe(
      ofType(ReferenceTablePageActions.rowCorrected),
      concatMap(({ tableId, rowId, correction }) =>
        client.correct(tableId, rowId, correction).pipe(
          map((table) => ReferenceTablesApiActions.rowCorrectedSuccess({ table })),
          catchError((error: unknown) => of(ReferenceTablesApiActions.rowCorrectedFailure({ message: apiErrorMessage(error, 'The correction could not be saved.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const chooseLabTable = createEffect(
  (actions$ = inject(Actions), client = inject(ReferenceTablesClient)) =>
    actions$.pipe(
      ofType(ReferenceTablesPageActions.labTableChosen, ReferenceTablePageActions.labTableChosen),
      exhaustMap(({ tableId }) =>
        client.chooseLabTable(tableId).pipe(
          map((list) => ReferenceTablesApiActions.labTableChosenSuccess({ list })),
          catchError((error: unknown) => of(ReferenceTablesApiActions.labTableChosenFailure({ message: apiErrorMessage(error, 'The choice could not be saved.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const showReferenceTablesFeedback = createEffect(
  (actions$ = inject(Actions), snackBar = inject(MatSnackBar)) =>
    actions$.pipe(
      ofType(
        ReferenceTablesApiActions.rowCorrectedSuccess,
        ReferenceTablesApiActions.labTableChosenSuccess,
        ReferenceTablesApiActions.rowCorrectedFailure,
        ReferenceTablesApiActions.labTableChosenFailure,
        ReferenceTablesApiActions.listLoadedFailure,
        ReferenceTablesApiActions.tableLoadedFailure,
      ),
      map((action) => {
        if (action.type === ReferenceTablesApiActions.rowCorrectedSuccess.type) return `Correction saved; the audit now flags ${action.table.audit.flagged.length} row(s).`;
        if (action.type === ReferenceTablesApiActions.labTableChosenSuccess.type) {
          return action.list.labTableId === null ? 'The lab analysis now reads the built-in OIML R 22 equation.' : 'The lab analysis now reads the chosen table.';
        }
        return action.message;
      }),
      tap((message) => snackBar.open(message, 'Dismiss', { duration: 5000 })),
    ),
  { functional: true, dispatch: false },
);
