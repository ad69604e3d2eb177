import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as batchesEffects from '@app/batches/state/batches.effects';
import { batchesFeature } from '@app/batches/state/batches.feature';

export const todayRoutes: Routes = [
  {
    path: '',
    providers: [provideState(batchesFeature), provideEffects(batchesEffects)],
    loadComponent: () => import('./today-page/today-page').then((m) => m.TodayPage),
  },
];
