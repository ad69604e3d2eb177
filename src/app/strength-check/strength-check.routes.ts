import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as batchStrengthEffects from './state/batch-strength.effects';
import { batchStrengthFeature } from './state/batch-strength.feature';
import * as toleranceClassesEffects from './state/tolerance-classes.effects';
import { toleranceClassesFeature } from './state/tolerance-classes.feature';

export const strengthCheckRoutes: Routes = [
  {
    path: '',
    providers: [provideState(toleranceClassesFeature), provideState(batchStrengthFeature), provideEffects(toleranceClassesEffects, batchStrengthEffects)],
    children: [
      { path: '', loadComponent: () => import('./strength-check-page/strength-check-page').then((m) => m.StrengthCheckPage) },
      {
        path: 'batches/:batchId',
        title: 'Strength check of a batch · Commonwort',
        loadComponent: () => import('./batch-strength-page/batch-strength-page').then((m) => m.BatchStrengthPage),
      },
      {
        path: 'batches/:batchId/records/:signOffId',
        title: 'Strength record · Commonwort',
        loadComponent: () => import('./strength-record-page/strength-record-page').then((m) => m.StrengthRecordPage),
      },
    ],
  },
];
