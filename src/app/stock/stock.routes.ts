import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as stockDialogsEffects from './state/stock-dialogs.effects';
import * as stockEffects from './state/stock.effects';
import { stockFeature } from './state/stock.feature';

export const stockRoutes: Routes = [
  {
    path: '',
    providers: [provideState(stockFeature), provideEffects(stockEffects, stockDialogsEffects)],
    children: [
      { path: '', loadComponent: () => import('./stock-page/stock-page').then((m) => m.StockPage) },
      { path: 'to-buy', title: 'What to buy · Commonwort', loadComponent: () => import('./shopping-list-page/shopping-list-page').then((m) => m.ShoppingListPage) },
    ],
  },
];
