import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { generateMockBooking, generateMockKitItem } from '@app/testing/booking-mock';
import { KitRoomApiActions } from './kit-room-api.actions';
import { KitRoomPageActions } from './kit-room-page.actions';
import { initialKitRoomState, kitRoomFeature, KitRoomState } from './kit-room.feature';

const { reducer } = kitRoomFeature;

describe('kitRoomFeature reducer', () => {
  it('anchors the calendar on today when the page first opens, and keeps a chosen period on return', () => {
    const opened = reducer(initialKitRoomState, KitRoomPageActions.opened({ today: '2026-12-02' }));
    const moved = reducer(opened, KitRoomPageActions.periodChanged({ anchor: '2026-12-09' }));

    expect(opened.anchor).toBe('2026-12-02');
    expect(reducer(moved, KitRoomPageActions.opened({ today: '2026-12-02' })).anchor).toBe('2026-12-09');
  });

  it('adds a made booking to the calendar, counts it and keeps the server’s refusal with its fields', () => {
    const booking = generateMockBooking();
    const submitting = reducer(initialKitRoomState, KitRoomPageActions.bookingSubmitted({ request: { kitItemId: 2, start: booking.startLocal, end: booking.endLocal } }));
    const made = reducer(submitting, KitRoomApiActions.bookingCreatedSuccess({ booking }));
    const refused = reducer(submitting, KitRoomApiActions.bookingCreatedFailure({ message: 'F2 is booked by Jonah Weiss (booking #40)…', fields: null }));

    expect(submitting.booking).toBe(true);
    expect(made).toMatchObject({ booking: false, bookingsCreated: 1, bookings: [booking] });
    expect(refused).toMatchObject({ booking: false, bookingError: 'F2 is booked by Jonah Weiss (booking #40)…' });
  });

  it('removes a cancelled booking from the calendar and from my bookings', () => {
    const booking = generateMockBooking();
    const state: KitRoomState = { ...initialKitRoomState, bookings: [booking], myBookings: [booking] };

    const after = reducer(state, KitRoomApiActions.bookingCancelledSuccess({ bookingId: booking.id }));

    expect(after.bookings).toEqual([]);
    expect(after.myBookings).toEqual([]);
  });

  it('replaces a saved item in code order and keeps its next service date', () => {
    const f2 = generateMockKitItem({ nextMaintenanceDueOn: '2027-03-01' });
    const f1 = generateMockKitItem({ id: 1, code: 'F1' });
    const state: KitRoomState = { ...initialKitRoomState, items: [f2] };

    const withNew = reducer(state, KitRoomApiActions.itemSavedSuccess({ item: { ...f1 } }));
    const changed = reducer(withNew, KitRoomApiActions.itemSavedSuccess({ item: { ...f2, state: 'maintenance' } }));

    expect(changed.items.map((item) => item.code)).toEqual(['F1', 'F2']);
    expect(changed.items[1]).toMatchObject({ state: 'maintenance', nextMaintenanceDueOn: '2027-03-01' });
  });

  it('forgets everything on sign-out', () => {
    const state: KitRoomState = { ...initialKitRoomState, myBookings: [generateMockBooking()] };
    expect(reducer(state, AuthApiActions.signOutSuccess())).toEqual(initialKitRoomState);
  });
});
