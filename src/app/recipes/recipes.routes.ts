import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as catalogueSnackBarEffects from '@app/catalogue/state/catalogue-snack-bar.effects';
import * as catalogueEntriesEffects from '@app/catalogue/state/catalogue-entries.effects';
import * as catalogueImportEffects from '@app/catalogue/state/catalogue-import.effects';
import * as catalogueLoadsEffects from '@app/catalogue/state/catalogue-loads.effects';
import * as stylesBrewhouseEffects from '@app/catalogue/state/styles-brewhouse.effects';
import { catalogueFeature } from '@app/catalogue/state/catalogue.feature';
import * as preferencesEffects from './state/preferences.effects';
import * as recipeArchiveConfirmationEffects from './state/recipe-archive-confirmation.effects';
import * as recipeFileEffects from './state/recipe-file.effects';
import * as recipeTitleEffects from './state/recipe-title.effects';
import * as recipeVersionsEffects from './state/recipe-versions.effects';
import * as recipesSnackBarEffects from './state/recipes-snack-bar.effects';
import * as recipesEffects from './state/recipes.effects';
import { recipesFeature } from './state/recipes.feature';
import { unsavedEditsFeature } from './state/unsaved-edits.feature';
import { unsavedEditsGuard } from './unsaved-edits-guard';

export const recipesRoutes: Routes = [
  {
    path: '',
    providers: [
      provideState(recipesFeature),
      provideState(catalogueFeature),
      provideState(unsavedEditsFeature),
      provideEffects(
        recipeTitleEffects,
        recipeArchiveConfirmationEffects,
        recipesEffects,
        recipeFileEffects,
        recipeVersionsEffects,
        preferencesEffects,
        recipesSnackBarEffects,
        catalogueLoadsEffects,
        catalogueEntriesEffects,
        catalogueImportEffects,
        stylesBrewhouseEffects,
        catalogueSnackBarEffects,
      ),
    ],
    children: [
      { path: '', loadComponent: () => import('./recipe-list-page/recipe-list-page').then((m) => m.RecipeListPage) },
      {
        path: 'catalogue',
        title: 'Ingredient catalogue · Commonwort',
        loadComponent: () => import('@app/catalogue/catalogue-page/catalogue-page').then((m) => m.CataloguePage),
      },
      {
        path: 'new',
        title: 'New recipe · Commonwort',
        canDeactivate: [unsavedEditsGuard],
        loadComponent: () => import('./recipe-editor-page/recipe-editor-page').then((m) => m.RecipeEditorPage),
      },
      {
        path: ':recipeId',
        canDeactivate: [unsavedEditsGuard],
        loadComponent: () => import('./recipe-editor-page/recipe-editor-page').then((m) => m.RecipeEditorPage),
      },
      {
        path: ':recipeId/versions',
        title: 'Recipe versions · Commonwort',
        loadComponent: () => import('./recipe-versions-page/recipe-versions-page').then((m) => m.RecipeVersionsPage),
      },
      {
        path: ':recipeId/brew-day',
        title: 'Brew-day sheet · Commonwort',
        loadComponent: () => import('./brew-day-sheet/brew-day-sheet-page').then((m) => m.BrewDaySheetPage),
      },
    ],
  },
];
