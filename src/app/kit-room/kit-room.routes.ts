import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import { roleGuard } from '@app/auth/role-guard';
import * as feedLinkEffects from './state/feed-link.effects';
import * as kitRegisterEffects from './state/kit-register.effects';
import * as kitRoomFeedbackEffects from './state/kit-room-feedback.effects';
import * as kitRoomEffects from './state/kit-room.effects';
import { kitRoomFeature } from './state/kit-room.feature';

export const kitRoomRoutes: Routes = [
  {
    path: '',
    providers: [
      provideState(kitRoomFeature),
      provideEffects(kitRoomEffects, feedLinkEffects, kitRegisterEffects, kitRoomFeedbackEffects),
    ],
    children: [
      { path: '', loadComponent: () => import('./kit-room-page/kit-room-page').then((m) => m.KitRoomPage) },
      {
        path: 'register',
        title: 'Kit register · Commonwort',
        canActivate: [roleGuard(['admin'])],
        loadComponent: () => import('./kit-register-page/kit-register-page').then((m) => m.KitRegisterPage),
      },
    ],
  },
];
