import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as membersFeedbackEffects from './state/members-feedback.effects';
import * as membersEffects from './state/members.effects';
import { membersFeature } from './state/members.feature';

export const membersRoutes: Routes = [
  {
    path: '',
    providers: [provideState(membersFeature), provideEffects(membersEffects, membersFeedbackEffects)],
    loadComponent: () => import('./members-page/members-page').then((m) => m.MembersPage),
  },
];
