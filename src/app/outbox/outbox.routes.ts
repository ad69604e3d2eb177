import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as outboxEffects from './state/outbox.effects';
import { outboxFeature } from './state/outbox.feature';

export const outboxRoutes: Routes = [
  {
    path: '',
    providers: [provideState(outboxFeature), provideEffects(outboxEffects)],
    loadComponent: () => import('./outbox-page/outbox-page').then((m) => m.OutboxPage),
  },
];
