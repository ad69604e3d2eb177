import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import { provideMaterialSymbols } from '@app/core/material-symbols';
import { signedOutGuard } from './signed-out-guard';
import * as accountEffects from './state/account.effects';
import { accountFeature } from './state/account.feature';

/** The signed-out pages; their first segments are listed in ACCOUNT_PAGE_PATHS. */
export const authRoutes: Routes = [
  {
    path: '',
    providers: [provideState(accountFeature), provideEffects(accountEffects), provideMaterialSymbols()],
    children: [
      {
        path: 'sign-in',
        title: 'Sign in · Commonwort',
        canActivate: [signedOutGuard],
        loadComponent: () => import('./sign-in-page/sign-in-page').then((m) => m.SignInPage),
      },
      {
        path: 'forgot-password',
        title: 'Forgot your password · Commonwort',
        loadComponent: () => import('./forgot-password-page/forgot-password-page').then((m) => m.ForgotPasswordPage),
      },
      {
        path: 'reset-password/:token',
        title: 'New password · Commonwort',
        loadComponent: () => import('./reset-password-page/reset-password-page').then((m) => m.ResetPasswordPage),
      },
      {
        path: 'invitations/:token',
        title: 'Join the co-op · Commonwort',
        loadComponent: () =>
          import('./accept-invitation-page/accept-invitation-page').then((m) => m.AcceptInvitationPage),
      },
    ],
  },
];
