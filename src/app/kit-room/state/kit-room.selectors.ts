import { createSelector } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { periodDays, periodTitle } from '../calendar-period';
import { holdsOnDay } from '../day-holds';
import { kitRoomFeature } from './kit-room.feature';

/** The calendar's days with the holds on each, for the period and item filter chosen. */
export const selectCalendarViewModel = createSelector(
  kitRoomFeature.selectBookings,
  kitRoomFeature.selectView,
  kitRoomFeature.selectAnchor,
  kitRoomFeature.selectItemFilter,
  authFeature.selectCoopTimeZone,
  (bookings, view, anchor, itemFilter, zone) => {
    if (!anchor) return null;
    const shown = itemFilter === null ? bookings : bookings.filter((each) => each.kitItemId === itemFilter);
    return {
      view,
      anchor,
      itemFilter,
      title: periodTitle(view, anchor),
      days: periodDays(view, anchor).map((day) => ({ day, holds: holdsOnDay(shown, day, zone) })),
    };
  },
);

/** The first and last day the calendar asks the server for. */
export const selectCalendarRange = createSelector(kitRoomFeature.selectView, kitRoomFeature.selectAnchor, kitRoomFeature.selectItemFilter, (view, anchor, itemFilter) => {
  if (!anchor) return null;
  const days = periodDays(view, anchor);
  return { from: days[0], to: days[days.length - 1], itemFilter };
});

/** Items that can take a booking now. */
export const selectBookableItems = createSelector(kitRoomFeature.selectItems, (items) => items.filter((item) => item.state === 'in_service'));
