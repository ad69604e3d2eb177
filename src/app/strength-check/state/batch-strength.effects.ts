import { inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router } from '@angular/router';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { Store } from '@ngrx/store';
import { catchError, exhaustMap, map, merge, of, switchMap, tap, withLatestFrom } from 'rxjs';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { BatchStrengthClient } from '../batch-strength-client';
import { BatchStrengthApiActions } from './batch-strength-api.actions';
import { BatchStrengthPageActions } from './batch-strength-page.actions';
import { batchStrengthFeature } from './batch-strength.feature';
import { StrengthCheckPageActions } from './strength-check-page.actions';
import { StrengthRecordPageActions } from './strength-record-page.actions';

export const loadBatches = createEffect(
  (actions$ = inject(Actions), client = inject(BatchStrengthClient)) =>
    actions$.pipe(
      ofType(StrengthCheckPageActions.opened),
      switchMap(() =>
        client.batches().pipe(
          map((batches) => BatchStrengthApiActions.batchesLoadedSuccess({ batches })),
          catchError((error: unknown) => of(BatchStrengthApiActions.batchesLoadedFailure({ message: apiErrorMessage(error, 'The batches could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadCheck = createEffect(
  (actions$ = inject(Actions), client = inject(BatchStrengthClient), store = inject(Store)) =>
    merge(
      actions$.pipe(ofType(BatchStrengthPageActions.opened), map(({ batchId }) => ({ batchId, declared: null }))),
      actions$.pipe(ofType(BatchStrengthPageActions.declaredStrengthChecked)),
      actions$.pipe(
        ofType(BatchStrengthApiActions.analysisRecordedSuccess),
        withLatestFrom(store.select(batchStrengthFeature.selectDeclared)),
        map(([{ analysis }, declared]) => ({ batchId: analysis.batchId, declared })),
      ),
    ).pipe(
      switchMap(({ batchId, declared }) =>
        client.check(batchId, declared).pipe(
          map((check) => BatchStrengthApiActions.checkLoadedSuccess({ check, declared })),
          catchError((error: unknown) => of(BatchStrengthApiActions.checkLoadedFailure({ message: apiErrorMessage(error, 'The strength check could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const signOff = createEffect(
  (actions$ = inject(Actions), client = inject(BatchStrengthClient)) =>
    actions$.pipe(
      ofType(BatchStrengthPageActions.signOffRequested),
      exhaustMap(({ batchId, request }) =>
        client.signOff(batchId, request).pipe(
          map((record) => BatchStrengthApiActions.signedOffSuccess({ record })),
          catchError((error: unknown) => of(BatchStrengthApiActions.signedOffFailure({ message: apiErrorMessage(error, 'The sign-off could not be saved.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const openSignedRecord = createEffect(
  (actions$ = inject(Actions), router = inject(Router)) =>
    actions$.pipe(
      ofType(BatchStrengthApiActions.signedOffSuccess),
      tap(({ record }) => void router.navigate(['/strength-check', 'batches', record.batchId, 'records', record.id])),
    ),
  { functional: true, dispatch: false },
);

export const loadRecord = createEffect(
  (actions$ = inject(Actions), client = inject(BatchStrengthClient)) =>
    actions$.pipe(
      ofType(StrengthRecordPageActions.opened),
      switchMap(({ batchId, signOffId }) =>
        client.record(batchId, signOffId).pipe(
          map((record) => BatchStrengthApiActions.recordLoadedSuccess({ record })),
          catchError((error: unknown) => of(BatchStrengthApiActions.recordLoadedFailure({ message: apiErrorMessage(error, 'The strength record could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const recordAnalysis = createEffect(
  (actions$ = inject(Actions), client = inject(BatchStrengthClient)) =>
    actions$.pipe(
      ofType(BatchStrengthPageActions.distillateAnalysed),
      exhaustMap(({ request }) =>
        client.analyse(request).pipe(
          map((analysis) => BatchStrengthApiActions.analysisRecordedSuccess({ analysis })),
          catchError((error: unknown) =>
            of(BatchStrengthApiActions.analysisRecordedFailure({ message: apiErrorMessage(error, 'The analysis could not be saved.'), fields: apiFieldErrors(error) })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const showBatchStrengthFeedback = createEffect(
  (actions$ = inject(Actions), snackBar = inject(MatSnackBar)) =>
    actions$.pipe(
      ofType(BatchStrengthApiActions.signedOffFailure, BatchStrengthApiActions.analysisRecordedSuccess, BatchStrengthApiActions.batchesLoadedFailure),
      map((action) => ('analysis' in action ? `Lab analysis saved: ${action.analysis.beerPercentVolume20.value.toFixed(2)} % vol at 20 °C.` : action.message)),
      tap((message) => snackBar.open(message, 'Dismiss', { duration: 5000 })),
    ),
  { functional: true, dispatch: false },
);
