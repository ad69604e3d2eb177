import { Routes } from '@angular/router';
import { provideLuxonDateAdapter } from '@angular/material-luxon-adapter';
import { provideEffects } from '@ngrx/effects';
import { provideState } from '@ngrx/store';
import * as brewPlanFeedbackEffects from './state/brew-plan-feedback.effects';
import * as brewPlanEffects from './state/brew-plan.effects';
import { brewPlanFeature } from './state/brew-plan.feature';

/** Dates typed as yyyy-MM-dd (unambiguous in any locale) and shown the same way. */
const BREW_PLAN_DATE_FORMATS = {
  parse: { dateInput: ['yyyy-MM-dd', 'd/M/yyyy', 'D'] },
  display: { dateInput: 'yyyy-MM-dd', monthYearLabel: 'LLL yyyy', dateA11yLabel: 'DDD', monthYearA11yLabel: 'LLLL yyyy' },
};

export const brewPlanRoutes: Routes = [
  {
    path: '',
    providers: [provideState(brewPlanFeature), provideEffects(brewPlanEffects, brewPlanFeedbackEffects), provideLuxonDateAdapter(BREW_PLAN_DATE_FORMATS)],
    loadComponent: () => import('./brew-plan-page/brew-plan-page').then((m) => m.BrewPlanPage),
  },
];
