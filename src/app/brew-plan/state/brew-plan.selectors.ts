import { createSelector } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { buildTimelineView } from '../view-models/timeline-view';
import { brewPlanFeature } from './brew-plan.feature';

export const selectTimelineView = createSelector(brewPlanFeature.selectTimeline, buildTimelineView);

/** Admins and brewers plan; members read the plan. */
export const selectMayPlan = createSelector(authFeature.selectRoles, (roles) => roles.includes('admin') || roles.includes('brewer'));
