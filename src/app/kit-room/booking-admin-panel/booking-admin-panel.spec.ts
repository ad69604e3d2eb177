import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MoveBookingRequest } from '@shared/bookings';
import { generateMockBooking } from '@app/testing/booking-mock';
import { BookingAdminPanel } from './booking-admin-panel';

describe('BookingAdminPanel', () => {
  let fixture: ComponentFixture<BookingAdminPanel>;
  let element: HTMLElement;
  const moves: { bookingId: number; request: MoveBookingRequest }[] = [];
  const cancels: number[] = [];

  beforeEach(async () => {
    moves.length = 0;
    cancels.length = 0;
    fixture = TestBed.createComponent(BookingAdminPanel);
    fixture.componentRef.setInput('booking', generateMockBooking());
    fixture.componentInstance.moveSubmitted.subscribe((move) => moves.push(move));
    fixture.componentInstance.bookingCancelled.subscribe((id) => cancels.push(id));
    element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  const button = (text: string) => [...element.querySelectorAll('button')].find((b) => b.textContent?.trim() === text) as HTMLButtonElement;

  it('emits the new wall-clock times of the booking when moved', async () => {
    const start = element.querySelector<HTMLInputElement>('input[formcontrolname="start"]')!;
    start.value = '2026-12-10T08:00';
    start.dispatchEvent(new Event('input'));

    button('Move booking').click();
    await fixture.whenStable();

    expect(moves).toEqual([{ bookingId: 41, request: { start: '2026-12-10T08:00', end: '2026-12-11T10:00' } }]);
  });

  it('cancels only after the admin confirms', async () => {
    button('Cancel booking').click();
    await fixture.whenStable();
    expect(cancels).toEqual([]);

    button('Yes, cancel it').click();

    expect(cancels).toEqual([41]);
  });
});
