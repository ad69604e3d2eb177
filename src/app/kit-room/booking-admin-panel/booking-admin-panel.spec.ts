import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideCoopDateAdapter } from '@app/ui/coop-date-formats';
import { DateTime } from 'luxon';
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
    TestBed.configureTestingModule({ providers: [provideCoopDateAdapter()] });
    fixture = TestBed.createComponent(BookingAdminPanel);
    fixture.componentRef.setInput('booking', generateMockBooking());
    fixture.componentRef.setInput('today', DateTime.fromISO('2026-12-02', { zone: 'Europe/Berlin' }));
    fixture.componentInstance.moveSubmitted.subscribe((move) => moves.push(move));
    fixture.componentInstance.bookingCancelled.subscribe((id) => cancels.push(id));
    element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  const button = (text: string) => [...element.querySelectorAll('button')].find((b) => b.textContent?.trim() === text) as HTMLButtonElement;
  const field = (label: string) => {
    const formField = [...element.querySelectorAll('mat-form-field')].find((f) => f.querySelector('mat-label')?.textContent?.trim().startsWith(label));
    return formField!.querySelector('input') as HTMLInputElement;
  };
  const type = (input: HTMLInputElement, value: string) => {
    input.value = value;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new Event('blur'));
  };

  it('shows the booking’s wall-clock times in the date pickers and time fields', () => {
    expect([field('Start date').value, field('Start time').value, field('End date').value, field('End time').value]).toEqual(['2026-12-09', '10:00', '2026-12-11', '10:00']);
  });

  it('emits the new wall-clock times of the booking when moved', async () => {
    type(field('Start date'), '2026-12-10');
    type(field('Start time'), '08:00');

    button('Move booking').click();
    await fixture.whenStable();

    expect(moves).toEqual([{ bookingId: 41, request: { start: '2026-12-10T08:00', end: '2026-12-11T10:00' } }]);
  });

  it('refuses an end before the start and an empty day, saying so, and emits nothing', async () => {
    type(field('End date'), '2026-12-08');
    type(field('Start date'), '');

    button('Move booking').click();
    await fixture.whenStable();

    expect(moves).toEqual([]);
    expect(element.textContent).toContain('Pick the new first day (yyyy-MM-dd).');
  });

  it('refuses an end before the start with an alert', async () => {
    type(field('End date'), '2026-12-08');

    button('Move booking').click();
    await fixture.whenStable();

    expect(moves).toEqual([]);
    expect(element.querySelector('[role="alert"]')?.textContent).toContain('The end must come after the start.');
  });

  it('cancels only after the admin confirms', async () => {
    button('Cancel booking').click();
    await fixture.whenStable();
    expect(cancels).toEqual([]);

    button('Yes, cancel it').click();

    expect(cancels).toEqual([41]);
  });
});
