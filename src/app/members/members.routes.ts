import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as memberChangeConfirmationEffects from './state/member-change-confirmation.effects';
import * as membersFeedbackEffects from './state/members-feedback.effects';
import * as membersEffects from './state/members.effects';
import { membersFeature } from './state/members.feature';

export const membersRoutes: Routes = [
  {
    path: '',
    providers: [provideState(membersFeature), provideEffects(membersEffects, membersFeedbackEffects, memberChangeConfirmationEffects)],
    loadComponent: () => import('./members-page/members-page').then((m) => m.MembersPage),
  },
];
