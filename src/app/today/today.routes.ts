import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as batchesEffects from '@app/batches/state/batches.effects';
import { batchesFeature } from '@app/batches/state/batches.feature';
import * as stockAlertsEffects from '@app/stock/state/stock-alerts.effects';
import { stockFeature } from '@app/stock/state/stock.feature';

export const todayRoutes: Routes = [
  {
    path: '',
    providers: [provideState(batchesFeature), provideState(stockFeature), provideEffects(batchesEffects, stockAlertsEffects)],
    loadComponent: () => import('./today-page/today-page').then((m) => m.TodayPage),
  },
];
