import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import { roleGuard } from '@app/auth/role-guard';
import * as duesFeedbackEffects from './state/dues-feedback.effects';
import * as duesEffects from './state/dues.effects';
import { duesFeature } from './state/dues.feature';

export const duesRoutes: Routes = [
  {
    path: '',
    providers: [provideState(duesFeature), provideEffects(duesEffects, duesFeedbackEffects)],
    children: [
      { path: '', loadComponent: () => import('./dues-page/dues-page').then((m) => m.DuesPage) },
      {
        path: 'ledger',
        title: 'Dues ledger · Commonwort',
        canActivate: [roleGuard(['admin'])],
        loadComponent: () => import('./dues-ledger-page/dues-ledger-page').then((m) => m.DuesLedgerPage),
      },
    ],
  },
];
