import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as batchChangesEffects from './state/batch-changes.effects';
import * as batchesUiEffects from './state/batches-ui.effects';
import * as batchesEffects from './state/batches.effects';
import { batchesFeature } from './state/batches.feature';
import * as drawEffects from '@app/stock/state/draw.effects';
import { stockFeature } from '@app/stock/state/stock.feature';

export const batchesRoutes: Routes = [
  {
    path: '',
    providers: [provideState(batchesFeature), provideState(stockFeature), provideEffects(batchesEffects, batchChangesEffects, batchesUiEffects, drawEffects)],
    children: [
      { path: '', loadComponent: () => import('./batch-list-page/batch-list-page').then((m) => m.BatchListPage) },
      { path: 'new', title: 'Start a batch · Commonwort', loadComponent: () => import('./batch-start-page/batch-start-page').then((m) => m.BatchStartPage) },
      { path: ':batchId', title: 'Batch · Commonwort', loadComponent: () => import('./batch-page/batch-page').then((m) => m.BatchPage) },
    ],
  },
];
