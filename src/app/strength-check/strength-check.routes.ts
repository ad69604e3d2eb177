import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as toleranceClassesEffects from './state/tolerance-classes.effects';
import { toleranceClassesFeature } from './state/tolerance-classes.feature';

export const strengthCheckRoutes: Routes = [
  {
    path: '',
    providers: [provideState(toleranceClassesFeature), provideEffects(toleranceClassesEffects)],
    children: [
      { path: '', loadComponent: () => import('./strength-check-page/strength-check-page').then((m) => m.StrengthCheckPage) },
    ],
  },
];
