import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { Store } from '@ngrx/store';
import { catchError, concatMap, exhaustMap, filter, map, mergeMap, of, switchMap, withLatestFrom } from 'rxjs';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { BatchesClient } from '@app/batches/batches-client';
import { ReadingsClient } from '../readings-client';
import { GravityLogPageActions } from './gravity-log-page.actions';
import { ReadingsApiActions } from './readings-api.actions';
import { readingsFeature } from './readings.feature';

/** The log changed: the batch's progress and the page both need reloading. */
const LOG_CHANGED = [
  ReadingsApiActions.readingAddedSuccess,
  ReadingsApiActions.readingEditedSuccess,
  ReadingsApiActions.readingDeletedSuccess,
  ReadingsApiActions.correctionFactorSetSuccess,
] as const;

export const loadLogBatch = createEffect(
  (actions$ = inject(Actions), client = inject(BatchesClient), store = inject(Store)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.opened, ReadingsApiActions.readingAddedSuccess, ReadingsApiActions.readingDeletedSuccess, ReadingsApiActions.importFinished),
      filter((action) => action.type !== ReadingsApiActions.importFinished.type || action.result.imported > 0),
      withLatestFrom(store.select(readingsFeature.selectBatchId)),
      filter(([, batchId]) => batchId !== null),
      switchMap(([, batchId]) =>
        client.get(batchId!).pipe(
          map((batch) => ReadingsApiActions.batchLoadedSuccess({ batch })),
          catchError((error: unknown) => of(ReadingsApiActions.batchLoadedFailure({ message: apiErrorMessage(error, 'The batch could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadReadings = createEffect(
  (actions$ = inject(Actions), client = inject(ReadingsClient), store = inject(Store)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.opened, GravityLogPageActions.pageChanged, GravityLogPageActions.sortChanged, ReadingsApiActions.importFinished, ...LOG_CHANGED),
      withLatestFrom(store.select(readingsFeature.selectReadingsState)),
      filter(([, state]) => state.batchId !== null),
      switchMap(([, s]) =>
        client.page(s.batchId!, { offset: s.pageIndex * s.pageSize, limit: s.pageSize, sort: s.sort, direction: s.direction }).pipe(
          map((page) => ReadingsApiActions.readingsLoadedSuccess({ page })),
          catchError((error: unknown) => of(ReadingsApiActions.readingsLoadedFailure({ message: apiErrorMessage(error, 'The readings could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const addReading = createEffect(
  (actions$ = inject(Actions), client = inject(ReadingsClient)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.readingSubmitted),
      concatMap(({ batchId, input }) =>
        client.add(batchId, input).pipe(
          map((reading) => ReadingsApiActions.readingAddedSuccess({ reading })),
          catchError((error: unknown) => of(ReadingsApiActions.readingAddedFailure({ message: apiErrorMessage(error, 'The reading could not be saved.'), fields: apiFieldErrors(error) }))),
        ),
      ),
    ),
  { functional: true },
);

export const editReading = createEffect(
  (actions$ = inject(Actions), client = inject(ReadingsClient)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.readingEditSubmitted),
      concatMap(({ readingId, changes }) =>
        client.edit(readingId, changes).pipe(
          map((reading) => ReadingsApiActions.readingEditedSuccess({ reading })),
          catchError((error: unknown) => of(ReadingsApiActions.readingEditedFailure({ message: apiErrorMessage(error, 'The correction could not be saved.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const deleteReading = createEffect(
  (actions$ = inject(Actions), client = inject(ReadingsClient)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.readingDeleteConfirmed),
      mergeMap(({ readingId }) =>
        client.remove(readingId).pipe(
          map(() => ReadingsApiActions.readingDeletedSuccess({ readingId })),
          catchError((error: unknown) => of(ReadingsApiActions.readingDeletedFailure({ message: apiErrorMessage(error, 'The reading could not be deleted.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const setCorrectionFactor = createEffect(
  (actions$ = inject(Actions), client = inject(BatchesClient)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.correctionFactorSubmitted),
      exhaustMap(({ batchId, request }) =>
        client.setCorrectionFactor(batchId, request).pipe(
          map((batch) => ReadingsApiActions.correctionFactorSetSuccess({ batch })),
          catchError((error: unknown) => of(ReadingsApiActions.correctionFactorSetFailure({ message: apiErrorMessage(error, 'The correction factor could not be set.') }))),
        ),
      ),
    ),
  { functional: true },
);
