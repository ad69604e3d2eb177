import { inject } from '@angular/core';
import { Title } from '@angular/platform-browser';
import { Router } from '@angular/router';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { tap } from 'rxjs';
import { recipeTabTitle } from '../view-models/recipe-tab-title';
import { RecipesApiActions } from './recipes-api.actions';

export const showRecipeTitle = createEffect(
  (actions$ = inject(Actions), title = inject(Title), router = inject(Router)) =>
    actions$.pipe(
      ofType(RecipesApiActions.recipeLoadedSuccess, RecipesApiActions.recipeSavedSuccess, RecipesApiActions.recipeUpdatedSuccess),
      tap(({ recipe }) => title.setTitle(recipeTabTitle(router.url, recipe.name))),
    ),
  { functional: true, dispatch: false },
);
