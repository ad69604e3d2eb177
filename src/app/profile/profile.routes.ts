import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as profileEffects from './state/profile.effects';
import { profileFeature } from './state/profile.feature';

export const profileRoutes: Routes = [
  {
    path: '',
    providers: [provideState(profileFeature), provideEffects(profileEffects)],
    loadComponent: () => import('./profile-page/profile-page').then((m) => m.ProfilePage),
  },
];
