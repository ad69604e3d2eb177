import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, forkJoin, map, of, switchMap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { RecipesClient } from '@app/recipes/recipes-client';
import { BatchesClient } from '../batches-client';
import { BatchListPageActions } from './batch-list-page.actions';
import { BatchPageActions } from './batch-page.actions';
import { BatchStartPageActions } from './batch-start-page.actions';
import { BatchesApiActions } from './batches-api.actions';
import { TodayPageActions } from '@app/today/state/today-page.actions';

export const loadBatches = createEffect(
  (actions$ = inject(Actions), client = inject(BatchesClient)) =>
    actions$.pipe(
      ofType(BatchListPageActions.opened, BatchListPageActions.scopeChanged, TodayPageActions.opened),
      switchMap((action) =>
        client.list(action.type === TodayPageActions.opened.type || action.mine).pipe(
          map((batches) => BatchesApiActions.batchesLoadedSuccess({ batches })),
          catchError((error: unknown) => of(BatchesApiActions.batchesLoadedFailure({ message: apiErrorMessage(error, 'The batches could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadBatch = createEffect(
  (actions$ = inject(Actions), client = inject(BatchesClient)) =>
    actions$.pipe(
      ofType(BatchPageActions.opened),
      switchMap(({ batchId }) =>
        client.get(batchId).pipe(
          map((batch) => BatchesApiActions.batchLoadedSuccess({ batch })),
          catchError((error: unknown) => of(BatchesApiActions.batchLoadedFailure({ message: apiErrorMessage(error, 'The batch could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadStartChoices = createEffect(
  (actions$ = inject(Actions), batches = inject(BatchesClient), recipes = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(BatchStartPageActions.opened),
      switchMap(() =>
        forkJoin({ recipes: recipes.list(false), fermenters: batches.fermenters() }).pipe(
          map((choices) => BatchesApiActions.startChoicesLoadedSuccess(choices)),
          catchError((error: unknown) => of(BatchesApiActions.startChoicesLoadedFailure({ message: apiErrorMessage(error, 'Recipes and fermenters could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadVersions = createEffect(
  (actions$ = inject(Actions), recipes = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(BatchStartPageActions.recipeChosen),
      switchMap(({ recipeId }) =>
        recipes.versions(recipeId).pipe(
          map((versions) => BatchesApiActions.versionsLoadedSuccess({ recipeId, versions })),
          catchError((error: unknown) => of(BatchesApiActions.versionsLoadedFailure({ message: apiErrorMessage(error, 'The recipe’s versions could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);
