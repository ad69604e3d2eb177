import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import { batchesFeature } from '@app/batches/state/batches.feature';
import * as batchesEffects from '@app/batches/state/batches.effects';
import * as gravityLogUiEffects from './state/gravity-log-ui.effects';
import * as pushTokensEffects from './state/push-tokens.effects';
import * as readingImportEffects from './state/reading-import.effects';
import * as readingsEffects from './state/readings.effects';
import { readingsFeature } from './state/readings.feature';

export const gravityLogRoutes: Routes = [
  {
    path: '',
    providers: [
      provideState(readingsFeature),
      provideState(batchesFeature),
      provideEffects(readingsEffects, readingImportEffects, pushTokensEffects, gravityLogUiEffects, batchesEffects),
    ],
    children: [
      { path: '', loadComponent: () => import('@app/batches/batch-list-page/batch-list-page').then((m) => m.BatchListPage), data: { linkBase: '/gravity-log' } },
      { path: ':batchId', loadComponent: () => import('./gravity-log-page/gravity-log-page').then((m) => m.GravityLogPage) },
    ],
  },
];
