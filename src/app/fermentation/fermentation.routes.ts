import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import { provideCharts, withDefaultRegisterables } from 'ng2-charts';
import * as fermentationEffects from './state/fermentation.effects';
import { fermentationFeature } from './state/fermentation.feature';

export const fermentationRoutes: Routes = [
  {
    path: ':batchId',
    providers: [provideState(fermentationFeature), provideEffects(fermentationEffects), provideCharts(withDefaultRegisterables())],
    loadComponent: () => import('./fermentation-page/fermentation-page').then((m) => m.FermentationPage),
  },
];
