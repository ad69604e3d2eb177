import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { Action, Store } from '@ngrx/store';
import { firstValueFrom, Observable, of, throwError } from 'rxjs';
import { generateMockBooking } from '@app/testing/booking-mock';
import { KitRoomClient } from '../kit-room-client';
import { KitRoomApiActions } from './kit-room-api.actions';
import { KitRoomPageActions } from './kit-room-page.actions';
import { createBooking, loadBookings } from './kit-room.effects';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const fakeClient = (overrides: Partial<Record<keyof KitRoomClient, (...args: never[]) => Observable<unknown>>>) => overrides as unknown as KitRoomClient;
const storeWith = (value: unknown) => ({ select: () => of(value) }) as unknown as Store;

describe('kit room effects', () => {
  it('loadBookings asks for the whole days of the period shown and the item chosen', async () => {
    const bookings = [generateMockBooking()];
    const list = jest.fn(() => of(bookings));

    const result = await firstValueFrom(
      loadBookings(actionsOf(KitRoomPageActions.viewChanged({ view: 'week' })), storeWith({ from: '2026-11-30', to: '2026-12-06', itemFilter: 2 }), fakeClient({ bookings: list })),
    );

    expect(list).toHaveBeenCalledWith('2026-11-30', '2026-12-06', 2);
    expect(result).toEqual(KitRoomApiActions.bookingsLoadedSuccess({ bookings }));
  });

  it('createBooking maps the made booking to Booking Created Success', async () => {
    const booking = generateMockBooking();
    const request = { kitItemId: 2, start: booking.startLocal, end: booking.endLocal };
    const book = jest.fn(() => of(booking));

    const result = await firstValueFrom(createBooking(actionsOf(KitRoomPageActions.bookingSubmitted({ request })), fakeClient({ book })));

    expect(book).toHaveBeenCalledWith(request);
    expect(result).toEqual(KitRoomApiActions.bookingCreatedSuccess({ booking }));
  });

  it('createBooking passes on the server’s words when the item is already held (409)', async () => {
    const message = 'F2 is booked by Jonah Weiss (booking #40) from Wed 9 Dec 10:00 until Fri 11 Dec 10:00…';
    const refusal = new HttpErrorResponse({ status: 409, error: { error: { code: 'booking-conflict', message } } });

    const result = await firstValueFrom(
      createBooking(actionsOf(KitRoomPageActions.bookingSubmitted({ request: { kitItemId: 2, start: '2026-12-09T10:00', end: '2026-12-10T10:00' } })), fakeClient({ book: () => throwError(() => refusal) })),
    );

    expect(result).toEqual(KitRoomApiActions.bookingCreatedFailure({ message, fields: null }));
  });
});
