import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideCoopDateAdapter } from '@app/ui/coop-date-formats';
import { provideRouter } from '@angular/router';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { initialAuthState } from '@app/auth/state/auth.feature';
import { generateMockBooking, generateMockKitItem } from '@app/testing/booking-mock';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { KitRoomPageActions } from '../state/kit-room-page.actions';
import { initialKitRoomState, KitRoomState } from '../state/kit-room.feature';
import { KitRoomPage } from './kit-room-page';

describe('KitRoomPage', () => {
  let fixture: ComponentFixture<KitRoomPage>;
  let store: MockStore;

  async function render(kitRoom: Partial<KitRoomState> = {}): Promise<HTMLElement> {
    TestBed.configureTestingModule({
      imports: [KitRoomPage],
      providers: [
        provideRouter([]),
        provideCoopDateAdapter(),
        provideMockStore({
          initialState: {
            auth: { ...initialAuthState, sessionLoaded: true, coopTimeZone: 'Europe/Berlin', user: generateMockSessionUser(['member'], { id: 7 }) },
            kitRoom: { ...initialKitRoomState, items: [generateMockKitItem()], anchor: '2026-12-09', ...kitRoom },
          },
        }),
      ],
    });
    store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
    fixture = TestBed.createComponent(KitRoomPage);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  it('dispatches Opened with today in the co-op zone and shows the week with its bookings', async () => {
    const booking = generateMockBooking();
    const element = await render({ bookings: [booking], myBookings: [booking] });

    expect(store.dispatch).toHaveBeenCalledWith(expect.objectContaining({ type: KitRoomPageActions.opened.type }));
    expect(element.querySelector('h1')?.textContent).toBe('Kit room');
    expect(element.querySelector('[data-day="2026-12-09"] .hold')?.textContent?.trim()).toBe('F2 · Priya Raman · from 10:00');
    expect(element.querySelector('cw-my-bookings')?.textContent).toContain('2026-12-09 10:00 – 2026-12-11 10:00');
  });

  it('dispatches Booking Cancelled only after the second, confirming click', async () => {
    const booking = generateMockBooking();
    const element = await render({ myBookings: [booking] });
    const button = (text: string) => [...element.querySelectorAll('cw-my-bookings button')].find((b) => b.textContent?.trim() === text) as HTMLButtonElement;

    button('Cancel booking').click();
    await fixture.whenStable();
    expect(store.dispatch).not.toHaveBeenCalledWith(KitRoomPageActions.bookingCancelled({ bookingId: booking.id }));
    button('Yes, cancel it').click();

    expect(store.dispatch).toHaveBeenCalledWith(KitRoomPageActions.bookingCancelled({ bookingId: booking.id }));
  });

  it('says so when nothing is booked in the period', async () => {
    const element = await render();

    expect(element.textContent).toContain('Nothing is booked in this period.');
  });
});
