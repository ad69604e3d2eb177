import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, forkJoin, map, of, switchMap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { RecipesClient } from '../recipes-client';
import { RecipeVersionsPageActions } from './recipe-versions-page.actions';
import { RecipesApiActions } from './recipes-api.actions';

export const loadVersions = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeVersionsPageActions.opened),
      switchMap(({ recipeId }) =>
        client.versions(recipeId).pipe(
          map((versions) => RecipesApiActions.versionsLoadedSuccess({ recipeId, versions })),
          catchError((error: unknown) => of(RecipesApiActions.versionsLoadedFailure({ message: apiErrorMessage(error, 'The versions could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadVersionPair = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeVersionsPageActions.versionsPicked),
      switchMap(({ recipeId, left, right }) =>
        forkJoin({ left: client.version(recipeId, left), right: client.version(recipeId, right) }).pipe(
          map((pair) => RecipesApiActions.versionPairLoadedSuccess(pair)),
          catchError((error: unknown) => of(RecipesApiActions.versionPairLoadedFailure({ message: apiErrorMessage(error, 'The versions could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);
