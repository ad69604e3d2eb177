import { Routes } from '@angular/router';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as brewPlanFeedbackEffects from './state/brew-plan-feedback.effects';
import * as brewPlanEffects from './state/brew-plan.effects';
import { brewPlanFeature } from './state/brew-plan.feature';

export const brewPlanRoutes: Routes = [
  {
    path: '',
    providers: [provideState(brewPlanFeature), provideEffects(brewPlanEffects, brewPlanFeedbackEffects)],
    loadComponent: () => import('./brew-plan-page/brew-plan-page').then((m) => m.BrewPlanPage),
  },
];
