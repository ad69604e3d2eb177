import { createSelector } from '@ngrx/store';
import { selectVisibleNavItems } from '@app/core/nav.selectors';

/** The areas that get a card on Today: every area the person may open, except Today itself. */
export const selectTodayAreaCards = createSelector(selectVisibleNavItems, (items) =>
  items.filter((item) => item.path !== '/today'),
);
