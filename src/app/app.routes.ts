import { Routes, UrlMatchResult, UrlSegment } from '@angular/router';
import { ACCOUNT_PAGE_PATHS } from './auth/account-page-paths';
import { roleGuard } from './auth/role-guard';
import { signedInGuard } from './auth/signed-in-guard';
import { provideMaterialSymbols } from './core/material-symbols';

/** Matches the signed-out pages without consuming a segment, so their chunk loads only for them. */
function accountPages(segments: UrlSegment[]): UrlMatchResult | null {
  return segments.length > 0 && ACCOUNT_PAGE_PATHS.includes(segments[0].path) ? { consumed: [] } : null;
}

export const routes: Routes = [
  { matcher: accountPages, loadChildren: () => import('./auth/auth.routes').then((m) => m.authRoutes) },
  {
    path: '',
    canActivate: [signedInGuard],
    providers: [provideMaterialSymbols()],
    loadComponent: () => import('./core/shell/shell').then((m) => m.Shell),
    children: [
      { path: '', pathMatch: 'full', redirectTo: 'today' },
      { path: 'today', title: 'Today · Commonwort', loadChildren: () => import('./today/today.routes').then((m) => m.todayRoutes) },
      { path: 'recipes', title: 'Recipes · Commonwort', loadChildren: () => import('./recipes/recipes.routes').then((m) => m.recipesRoutes) },
      { path: 'batches', title: 'Batches · Commonwort', loadChildren: () => import('./batches/batches.routes').then((m) => m.batchesRoutes) },
      { path: 'gravity-log', title: 'Gravity log · Commonwort', loadChildren: () => import('./gravity-log/gravity-log.routes').then((m) => m.gravityLogRoutes) },
      { path: 'kit-room', title: 'Kit room · Commonwort', loadChildren: () => import('./kit-room/kit-room.routes').then((m) => m.kitRoomRoutes) },
      {
        path: 'brew-plan/report',
        title: 'Production report · Commonwort',
        canActivate: [roleGuard(['admin'])],
        loadChildren: () => import('./production-report/production-report.routes').then((m) => m.productionReportRoutes),
      },
      { path: 'brew-plan', title: 'Brew plan · Commonwort', loadChildren: () => import('./brew-plan/brew-plan.routes').then((m) => m.brewPlanRoutes) },
      { path: 'stock', title: 'Stock · Commonwort', loadChildren: () => import('./stock/stock.routes').then((m) => m.stockRoutes) },
      {
        path: 'strength-check',
        title: 'Strength check · Commonwort',
        loadChildren: () => import('./strength-check/strength-check.routes').then((m) => m.strengthCheckRoutes),
      },
      {
        path: 'fermentation',
        title: 'Fermentation · Commonwort',
        loadChildren: () => import('./fermentation/fermentation.routes').then((m) => m.fermentationRoutes),
      },
      {
        path: 'reference-tables',
        title: 'Reference tables · Commonwort',
        loadChildren: () => import('./reference-tables/reference-tables.routes').then((m) => m.referenceTablesRoutes),
      },
      {
        path: 'members',
        title: 'Members · Commonwort',
        canActivate: [roleGuard(['admin'])],
        loadChildren: () => import('./members/members.routes').then((m) => m.membersRoutes),
      },
      { path: 'profile', title: 'Your profile · Commonwort', loadChildren: () => import('./profile/profile.routes').then((m) => m.profileRoutes) },
      { path: 'dues', title: 'Dues · Commonwort', loadChildren: () => import('./dues/dues.routes').then((m) => m.duesRoutes) },
      {
        path: 'outbox',
        title: 'Outbox · Commonwort',
        canActivate: [roleGuard(['admin'])],
        loadChildren: () => import('./outbox/outbox.routes').then((m) => m.outboxRoutes),
      },
      { path: 'production-report', redirectTo: 'brew-plan/report' },
      {
        path: 'not-allowed',
        title: 'Not allowed · Commonwort',
        loadComponent: () => import('./core/not-allowed-page/not-allowed-page').then((m) => m.NotAllowedPage),
      },
      {
        path: '**',
        title: 'Page not found · Commonwort',
        loadComponent: () => import('./core/not-found-page/not-found-page').then((m) => m.NotFoundPage),
      },
    ],
  },
];
