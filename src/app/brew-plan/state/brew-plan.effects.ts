import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { Store } from '@ngrx/store';
import { catchError, exhaustMap, filter, map, of, switchMap, withLatestFrom } from 'rxjs';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { BrewPlanClient } from '../brew-plan-client';
import { TIMELINE_WEEKS } from '../timeline-weeks';
import { BrewPlanApiActions } from './brew-plan-api.actions';
import { BrewPlanPageActions } from './brew-plan-page.actions';
import { brewPlanFeature } from './brew-plan.feature';

export const loadTimeline = createEffect(
  (actions$ = inject(Actions), store = inject(Store), client = inject(BrewPlanClient)) =>
    actions$.pipe(
      ofType(BrewPlanPageActions.opened, BrewPlanPageActions.periodChanged, BrewPlanApiActions.slotAcceptedSuccess, BrewPlanApiActions.batchMovedSuccess),
      withLatestFrom(store.select(brewPlanFeature.selectFrom)),
      map(([, from]) => from),
      filter((from) => from !== null),
      switchMap((from) =>
        client.timeline(from, TIMELINE_WEEKS).pipe(
          map((timeline) => BrewPlanApiActions.timelineLoadedSuccess({ timeline })),
          catchError((error: unknown) => of(BrewPlanApiActions.timelineLoadedFailure({ message: apiErrorMessage(error, 'The brew plan could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadRecipes = createEffect(
  (actions$ = inject(Actions), client = inject(BrewPlanClient)) =>
    actions$.pipe(
      ofType(BrewPlanPageActions.opened),
      filter(({ mayPlan }) => mayPlan),
      switchMap(() =>
        client.recipes().pipe(
          map((recipes) => BrewPlanApiActions.recipesLoadedSuccess({ recipes: recipes.filter((r) => !r.archived) })),
          catchError((error: unknown) => of(BrewPlanApiActions.recipesLoadedFailure({ message: apiErrorMessage(error, 'The recipes could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadBrewers = createEffect(
  (actions$ = inject(Actions), client = inject(BrewPlanClient)) =>
    actions$.pipe(
      ofType(BrewPlanPageActions.opened),
      filter(({ mayChooseBrewer }) => mayChooseBrewer),
      switchMap(() =>
        client.brewers().pipe(
          map((brewers) => BrewPlanApiActions.brewersLoadedSuccess({ brewers })),
          catchError((error: unknown) => of(BrewPlanApiActions.brewersLoadedFailure({ message: apiErrorMessage(error, 'The brewers could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const requestProposals = createEffect(
  (actions$ = inject(Actions), client = inject(BrewPlanClient)) =>
    actions$.pipe(
      ofType(BrewPlanPageActions.proposalsRequested),
      switchMap(({ request }) =>
        client.proposals(request).pipe(
          map((proposals) => BrewPlanApiActions.proposalsLoadedSuccess({ proposals })),
          catchError((error: unknown) =>
            of(BrewPlanApiActions.proposalsLoadedFailure({ message: apiErrorMessage(error, 'No proposals could be made.'), fields: apiFieldErrors(error) })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const acceptSlot = createEffect(
  (actions$ = inject(Actions), client = inject(BrewPlanClient)) =>
    actions$.pipe(
      ofType(BrewPlanPageActions.slotAccepted),
      exhaustMap(({ request }) =>
        client.accept(request).pipe(
          map((planned) => BrewPlanApiActions.slotAcceptedSuccess({ planned })),
          catchError((error: unknown) =>
            of(BrewPlanApiActions.slotAcceptedFailure({ message: apiErrorMessage(error, 'The slot could not be booked.'), fields: apiFieldErrors(error) })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const moveBatch = createEffect(
  (actions$ = inject(Actions), client = inject(BrewPlanClient)) =>
    actions$.pipe(
      ofType(BrewPlanPageActions.batchMoveSubmitted),
      exhaustMap(({ batchId, request }) =>
        client.move(batchId, request).pipe(
          map((planned) => BrewPlanApiActions.batchMovedSuccess({ planned })),
          catchError((error: unknown) => of(BrewPlanApiActions.batchMovedFailure({ batchId, message: apiErrorMessage(error, 'The batch could not be moved.') }))),
        ),
      ),
    ),
  { functional: true },
);
