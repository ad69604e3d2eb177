import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import { provideCharts, withDefaultRegisterables } from 'ng2-charts';
import * as referenceTablesEffects from './state/reference-tables.effects';
import { referenceTablesFeature } from './state/reference-tables.feature';

export const referenceTablesRoutes: Routes = [
  {
    path: '',
    providers: [provideState(referenceTablesFeature), provideEffects(referenceTablesEffects), provideCharts(withDefaultRegisterables())],
    children: [
      { path: '', loadComponent: () => import('./reference-tables-page/reference-tables-page').then((m) => m.ReferenceTablesPage) },
      {
        path: ':tableId',
        title: 'Reference table · Commonwort',
        loadComponent: () => import('./reference-table-page/reference-table-page').then((m) => m.ReferenceTablePage),
      },
    ],
  },
];
