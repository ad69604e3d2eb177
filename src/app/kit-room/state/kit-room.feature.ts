import { createFeature, createReducer, on } from '@ngrx/store';
import { Booking } from '@shared/bookings';
import { KitItemSummary, MaintenanceEntry } from '@shared/kit';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { FieldErrors } from '@app/ui/server-field-errors';
import { NamedChoice } from '../named-choice';
import { CalendarView } from '../calendar-period';
import { KitRegisterPageActions } from './kit-register-page.actions';
import { KitRoomApiActions } from './kit-room-api.actions';
import { KitRoomPageActions } from './kit-room-page.actions';

export interface KitRoomState {
  items: KitItemSummary[];
  /** Holds shown in the calendar's current period. */
  bookings: Booking[];
  myBookings: Booking[];
  /** My batches still under way, offered as the batch a booking serves. */
  myBatches: NamedChoice[];
  /** Active members an admin may book for (empty for others). */
  people: NamedChoice[];
  view: CalendarView;
  /** A day inside the period shown, yyyy-MM-dd in the co-op's zone. */
  anchor: string | null;
  itemFilter: number | null;
  loadError: string | null;
  booking: boolean;
  bookingError: string | null;
  bookingFieldErrors: FieldErrors | null;
  /** Counts successful bookings so the form can clear itself after each. */
  bookingsCreated: number;
  feedLinkActive: boolean;
  /** The feed address, shown once right after it is issued. */
  feedLinkUrl: string | null;
  /** Register page: the item whose maintenance log is open, and that log. */
  selectedItemId: number | null;
  maintenance: MaintenanceEntry[];
  savingItem: boolean;
  itemFieldErrors: FieldErrors | null;
  itemsSaved: number;
  maintenanceFieldErrors: FieldErrors | null;
  maintenanceRecorded: number;
}

export const initialKitRoomState: KitRoomState = {
  items: [],
  bookings: [],
  myBookings: [],
  myBatches: [],
  people: [],
  view: 'week',
  anchor: null,
  itemFilter: null,
  loadError: null,
  booking: false,
  bookingError: null,
  bookingFieldErrors: null,
  bookingsCreated: 0,
  feedLinkActive: false,
  feedLinkUrl: null,
  selectedItemId: null,
  maintenance: [],
  savingItem: false,
  itemFieldErrors: null,
  itemsSaved: 0,
  maintenanceFieldErrors: null,
  maintenanceRecorded: 0,
};

const byStart = (a: Booking, b: Booking) => a.startsAt.localeCompare(b.startsAt);
const replaceBooking = (list: Booking[], booking: Booking) => [...list.filter((each) => each.id !== booking.id), booking].sort(byStart);

export const kitRoomFeature = createFeature({
  name: 'kitRoom',
  reducer: createReducer(
    initialKitRoomState,
    on(KitRoomPageActions.opened, (state, { today }): KitRoomState => ({ ...state, anchor: state.anchor ?? today, loadError: null, feedLinkUrl: null })),
    on(KitRoomPageActions.viewChanged, (state, { view }): KitRoomState => ({ ...state, view })),
    on(KitRoomPageActions.periodChanged, (state, { anchor }): KitRoomState => ({ ...state, anchor })),
    on(KitRoomPageActions.itemFilterChanged, (state, { kitItemId }): KitRoomState => ({ ...state, itemFilter: kitItemId })),
    on(KitRoomApiActions.itemsLoadedSuccess, (state, { items }): KitRoomState => ({ ...state, items })),
    on(KitRoomApiActions.bookingsLoadedSuccess, (state, { bookings }): KitRoomState => ({ ...state, bookings })),
    on(KitRoomApiActions.peopleLoadedSuccess, (state, { people }): KitRoomState => ({ ...state, people })),
    on(KitRoomApiActions.myBatchesLoadedSuccess, (state, { batches }): KitRoomState => ({ ...state, myBatches: batches })),
    on(KitRoomApiActions.myBookingsLoadedSuccess, (state, { bookings }): KitRoomState => ({ ...state, myBookings: bookings })),
    on(
      KitRoomApiActions.itemsLoadedFailure,
      KitRoomApiActions.bookingsLoadedFailure,
      KitRoomApiActions.myBookingsLoadedFailure,
      (state, { message }): KitRoomState => ({ ...state, loadError: message }),
    ),
    on(KitRoomPageActions.bookingSubmitted, (state): KitRoomState => ({ ...state, booking: true, bookingError: null, bookingFieldErrors: null })),
    on(KitRoomApiActions.bookingCreatedSuccess, (state, { booking }): KitRoomState => ({
      ...state,
      booking: false,
      bookingsCreated: state.bookingsCreated + 1,
      bookings: replaceBooking(state.bookings, booking),
    })),
    on(KitRoomApiActions.bookingCreatedFailure, (state, { message, fields }): KitRoomState => ({ ...state, booking: false, bookingError: message, bookingFieldErrors: fields })),
    on(KitRoomApiActions.bookingMovedSuccess, (state, { booking }): KitRoomState => ({
      ...state,
      bookings: replaceBooking(state.bookings, booking),
      myBookings: state.myBookings.some((each) => each.id === booking.id) ? replaceBooking(state.myBookings, booking) : state.myBookings,
    })),
    on(KitRoomApiActions.bookingCancelledSuccess, (state, { bookingId }): KitRoomState => ({
      ...state,
      bookings: state.bookings.filter((each) => each.id !== bookingId),
      myBookings: state.myBookings.filter((each) => each.id !== bookingId),
    })),
    on(KitRoomApiActions.feedLinkStatusLoaded, (state, { status }): KitRoomState => ({ ...state, feedLinkActive: status.active })),
    on(KitRoomApiActions.feedLinkIssuedSuccess, (state, { link }): KitRoomState => ({ ...state, feedLinkActive: true, feedLinkUrl: link.url })),
    on(KitRoomApiActions.feedLinkRevokedSuccess, (state): KitRoomState => ({ ...state, feedLinkActive: false, feedLinkUrl: null })),
    on(KitRegisterPageActions.itemSubmitted, KitRegisterPageActions.itemChanged, (state): KitRoomState => ({ ...state, savingItem: true, itemFieldErrors: null })),
    on(KitRoomApiActions.itemSavedSuccess, (state, { item }): KitRoomState => {
      const existing = state.items.find((each) => each.id === item.id);
      const summary = { ...item, nextMaintenanceDueOn: existing?.nextMaintenanceDueOn ?? null };
      const items = [...state.items.filter((each) => each.id !== item.id), summary].sort((a, b) => a.code.localeCompare(b.code));
      return { ...state, items, savingItem: false, itemsSaved: state.itemsSaved + 1 };
    }),
    on(KitRoomApiActions.itemSavedFailure, (state, { fields }): KitRoomState => ({ ...state, savingItem: false, itemFieldErrors: fields })),
    on(KitRegisterPageActions.itemSelected, (state, { kitItemId }): KitRoomState => ({ ...state, selectedItemId: kitItemId, maintenance: [], maintenanceFieldErrors: null })),
    on(KitRoomApiActions.maintenanceLoadedSuccess, (state, { kitItemId, entries }): KitRoomState =>
      kitItemId === state.selectedItemId ? { ...state, maintenance: entries } : state,
    ),
    on(KitRegisterPageActions.maintenanceSubmitted, (state): KitRoomState => ({ ...state, maintenanceFieldErrors: null })),
    on(KitRoomApiActions.maintenanceRecordedSuccess, (state, { entry }): KitRoomState => ({
      ...state,
      maintenance: [entry, ...state.maintenance].sort((a, b) => b.performedOn.localeCompare(a.performedOn)),
      items: state.items.map((item) =>
        item.id === entry.kitItemId && entry.performedOn >= (state.maintenance[0]?.performedOn ?? '') ? { ...item, nextMaintenanceDueOn: entry.nextDueOn } : item,
      ),
      maintenanceRecorded: state.maintenanceRecorded + 1,
    })),
    on(KitRoomApiActions.maintenanceRecordedFailure, (state, { fields }): KitRoomState => ({ ...state, maintenanceFieldErrors: fields })),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (): KitRoomState => initialKitRoomState),
  ),
});
