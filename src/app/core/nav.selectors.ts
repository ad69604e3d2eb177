import { createSelector } from '@ngrx/store';
import { hasAnyRole } from '@shared/auth';
import { authFeature } from '@app/auth/state/auth.feature';
import { NAV_ITEMS, NavItem } from './nav-items';

/** The built areas the signed-in person may open, in the product's order. */
export const selectVisibleNavItems = createSelector(authFeature.selectRoles, (roles): NavItem[] =>
  NAV_ITEMS.filter((item) => item.available && (item.roles === null || hasAnyRole(roles, item.roles))),
);
