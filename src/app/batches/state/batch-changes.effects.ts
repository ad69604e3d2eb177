import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, exhaustMap, filter, forkJoin, map, of, switchMap } from 'rxjs';
import { BATCH_STATUS_LABELS } from '@shared/batches';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { BatchesClient } from '../batches-client';
import { BatchPageActions } from './batch-page.actions';
import { BatchStartPageActions } from './batch-start-page.actions';
import { BatchesApiActions } from './batches-api.actions';

const failed = (message: string) => (error: unknown) => of(BatchesApiActions.batchChangedFailure({ message: apiErrorMessage(error, message), fields: apiFieldErrors(error) }));

export const startBatch = createEffect(
  (actions$ = inject(Actions), client = inject(BatchesClient)) =>
    actions$.pipe(
      ofType(BatchStartPageActions.startSubmitted),
      exhaustMap(({ request }) =>
        client.create(request).pipe(
          map((batch) => BatchesApiActions.batchStartedSuccess({ batch })),
          catchError((error: unknown) => of(BatchesApiActions.batchStartedFailure({ message: apiErrorMessage(error, 'The batch could not be started.'), fields: apiFieldErrors(error) }))),
        ),
      ),
    ),
  { functional: true },
);

/** A single step goes straight to the server; a move that skips steps waits for the person's confirmation. */
export const moveStatus = createEffect(
  (actions$ = inject(Actions), client = inject(BatchesClient)) =>
    actions$.pipe(
      ofType(BatchPageActions.statusMoveChosen, BatchPageActions.skipConfirmed),
      filter((action) => action.type === BatchPageActions.skipConfirmed.type || action.skipped.length === 0),
      exhaustMap(({ batchId, status, type, at }) =>
        client.move(batchId, { status, confirmSkip: type === BatchPageActions.skipConfirmed.type, ...(at ? { at } : {}) }).pipe(
          map((batch) => BatchesApiActions.batchChangedSuccess({ batch, message: `${batch.name} is now ${BATCH_STATUS_LABELS[status].toLowerCase()}.` })),
          catchError(failed('The status could not be changed.')),
        ),
      ),
    ),
  { functional: true },
);

export const saveBrewDay = createEffect(
  (actions$ = inject(Actions), client = inject(BatchesClient)) =>
    actions$.pipe(
      ofType(BatchPageActions.brewDaySubmitted),
      exhaustMap(({ batchId, measured }) =>
        client.saveBrewDay(batchId, measured).pipe(
          map((batch) => BatchesApiActions.batchChangedSuccess({ batch, message: 'Brew-day measurements saved.' })),
          catchError(failed('The brew-day measurements could not be saved.')),
        ),
      ),
    ),
  { functional: true },
);

export const saveDetails = createEffect(
  (actions$ = inject(Actions), client = inject(BatchesClient)) =>
    actions$.pipe(
      ofType(BatchPageActions.detailsSubmitted),
      exhaustMap(({ batchId, changes }) =>
        client.update(batchId, changes).pipe(
          map((batch) => BatchesApiActions.batchChangedSuccess({ batch, message: 'Batch details saved.' })),
          catchError(failed('The batch details could not be saved.')),
        ),
      ),
    ),
  { functional: true },
);

/** The choices of the details form: active members for brewer, and the fermenters. */
export const loadEditChoices = createEffect(
  (actions$ = inject(Actions), client = inject(BatchesClient)) =>
    actions$.pipe(
      ofType(BatchPageActions.detailsEditOpened),
      switchMap(() =>
        forkJoin({ brewers: client.brewers(), fermenters: client.fermenters() }).pipe(
          map(({ brewers, fermenters }) => BatchesApiActions.editChoicesLoadedSuccess({ brewers, fermenters })),
          catchError((error: unknown) => of(BatchesApiActions.editChoicesLoadedFailure({ message: apiErrorMessage(error, 'Brewers and fermenters could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);
