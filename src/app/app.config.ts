import { provideHttpClient, withInterceptors, withXsrfConfiguration } from '@angular/common/http';
import {
  ApplicationConfig,
  ErrorHandler,
  isDevMode,
  provideBrowserGlobalErrorListeners,
  provideZonelessChangeDetection,
} from '@angular/core';
import { provideRouter, withComponentInputBinding } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideStore } from '@ngrx/store';
import * as authEffects from './auth/state/auth.effects';
import { authFeature } from './auth/state/auth.feature';
import { routes } from './app.routes';
import { apiErrorInterceptor } from './core/api-error-interceptor';
import { AppErrorHandler } from './core/app-error-handler';
import { provideCoopDateAdapter } from './ui/coop-date-formats';

export const appConfig: ApplicationConfig = {
  providers: [
    provideBrowserGlobalErrorListeners(),
    provideZonelessChangeDetection(),
    provideRouter(routes, withComponentInputBinding()),
    // Default names: the server sets the XSRF-TOKEN cookie, Angular echoes it as X-XSRF-TOKEN.
    provideHttpClient(withInterceptors([apiErrorInterceptor]), withXsrfConfiguration({})),
    provideStore(
      { [authFeature.name]: authFeature.reducer },
      { runtimeChecks: { strictActionImmutability: isDevMode(), strictStateImmutability: isDevMode() } },
    ),
    provideEffects(authEffects),
    provideCoopDateAdapter(),
    { provide: ErrorHandler, useClass: AppErrorHandler },
  ],
};
