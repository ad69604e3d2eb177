import { Routes } from '@angular/router';

export const todayRoutes: Routes = [
  { path: '', loadComponent: () => import('./today-page/today-page').then((m) => m.TodayPage) },
];
