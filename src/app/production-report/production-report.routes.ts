import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import { provideCharts, withDefaultRegisterables } from 'ng2-charts';
import * as productionReportEffects from './state/production-report.effects';
import { productionReportFeature } from './state/production-report.feature';

export const productionReportRoutes: Routes = [
  {
    path: '',
    providers: [provideState(productionReportFeature), provideEffects(productionReportEffects), provideCharts(withDefaultRegisterables())],
    loadComponent: () => import('./production-report-page/production-report-page').then((m) => m.ProductionReportPage),
  },
];
