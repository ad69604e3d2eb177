import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { Store } from '@ngrx/store';
import { exhaustMap, filter, map, of, withLatestFrom } from 'rxjs';
import { Confirmation } from '@app/ui/confirmation';
import { RecipeArchiveConfirmationActions } from './recipe-archive-confirmation.actions';
import { RecipeEditorPageActions } from './recipe-editor-page.actions';
import { recipesFeature } from './recipes.feature';

/** Archiving takes a recipe out of everyone's list and stops its editing, so it is asked first; restoring is not. */
export const confirmArchive = createEffect(
  (actions$ = inject(Actions), store = inject(Store), confirmation = inject(Confirmation)) =>
    actions$.pipe(
      ofType(RecipeEditorPageActions.archiveToggled),
      withLatestFrom(store.select(recipesFeature.selectCurrent)),
      exhaustMap(([{ recipeId, archived }, current]) => {
        const confirmed = RecipeArchiveConfirmationActions.archiveConfirmed({ recipeId, archived });
        if (!archived) return of(confirmed);
        const name = current?.id === recipeId ? current.name : 'this recipe';
        return confirmation
          .ask({
            title: `Archive ${name}?`,
            message: 'It leaves the recipe lists of everyone who sees it and can no longer be edited; its versions stay. "Show archived" finds it again, and its owner or an admin can restore it.',
            confirmLabel: 'Archive',
          })
          .pipe(filter(Boolean), map(() => confirmed));
      }),
    ),
  { functional: true },
);
