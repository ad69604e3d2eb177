import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as catalogueEffects from './state/catalogue.effects';
import { catalogueFeature } from './state/catalogue.feature';
import * as recipesEffects from './state/recipes.effects';
import * as recipesSnackBarEffects from './state/recipes-snack-bar.effects';
import { recipesFeature } from './state/recipes.feature';

export const recipesRoutes: Routes = [
  {
    path: '',
    providers: [
      provideState(recipesFeature),
      provideState(catalogueFeature),
      provideEffects(recipesEffects, recipesSnackBarEffects, catalogueEffects),
    ],
    children: [
      { path: '', loadComponent: () => import('./recipe-list-page/recipe-list-page').then((m) => m.RecipeListPage) },
      {
        path: 'catalogue',
        title: 'Ingredient catalogue · Commonwort',
        loadComponent: () => import('./catalogue-page/catalogue-page').then((m) => m.CataloguePage),
      },
      { path: 'new', title: 'New recipe · Commonwort', loadComponent: () => import('./recipe-editor-page/recipe-editor-page').then((m) => m.RecipeEditorPage) },
      { path: ':recipeId', loadComponent: () => import('./recipe-editor-page/recipe-editor-page').then((m) => m.RecipeEditorPage) },
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
