import { ChangeDetectionStrategy, Component, computed, inject, OnInit, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { DateTime } from 'luxon';
import { Booking, CreateBookingRequest, MoveBookingRequest } from '@shared/bookings';
import { authFeature } from '@app/auth/state/auth.feature';
import { BookingAdminPanel } from '../booking-admin-panel/booking-admin-panel';
import { BookingCalendar } from '../booking-calendar/booking-calendar';
import { BookingForm } from '../booking-form/booking-form';
import { CalendarView, stepPeriod } from '../calendar-period';
import { FeedLinkPanel } from '../feed-link-panel/feed-link-panel';
import { MyBookings } from '../my-bookings/my-bookings';
import { KitRoomPageActions } from '../state/kit-room-page.actions';
import { kitRoomFeature } from '../state/kit-room.feature';
import { selectBookableItems, selectCalendarViewModel } from '../state/kit-room.selectors';

@Component({
  selector: 'cw-kit-room-page',
  imports: [BookingAdminPanel, BookingCalendar, BookingForm, MyBookings, FeedLinkPanel, RouterLink, MatButton, MatIcon],
  templateUrl: './kit-room-page.html',
  styleUrl: './kit-room-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class KitRoomPage implements OnInit {
  private readonly store = inject(Store);

  protected readonly zone = this.store.selectSignal(authFeature.selectCoopTimeZone);
  protected readonly user = this.store.selectSignal(authFeature.selectUser);
  protected readonly calendar = this.store.selectSignal(selectCalendarViewModel);
  protected readonly items = this.store.selectSignal(kitRoomFeature.selectItems);
  protected readonly bookableItems = this.store.selectSignal(selectBookableItems);
  protected readonly myBookings = this.store.selectSignal(kitRoomFeature.selectMyBookings);
  protected readonly myBatches = this.store.selectSignal(kitRoomFeature.selectMyBatches);
  protected readonly people = this.store.selectSignal(kitRoomFeature.selectPeople);
  protected readonly loadError = this.store.selectSignal(kitRoomFeature.selectLoadError);
  protected readonly booking = this.store.selectSignal(kitRoomFeature.selectBooking);
  protected readonly bookingError = this.store.selectSignal(kitRoomFeature.selectBookingError);
  protected readonly bookingFieldErrors = this.store.selectSignal(kitRoomFeature.selectBookingFieldErrors);
  protected readonly bookingsCreated = this.store.selectSignal(kitRoomFeature.selectBookingsCreated);
  protected readonly feedLinkActive = this.store.selectSignal(kitRoomFeature.selectFeedLinkActive);
  protected readonly feedLinkUrl = this.store.selectSignal(kitRoomFeature.selectFeedLinkUrl);
  protected readonly isAdmin = computed(() => this.user()?.roles.includes('admin') ?? false);
  protected readonly today = computed(() => DateTime.now().setZone(this.zone()).startOf('day'));
  protected readonly todayIso = computed(() => this.today().toISODate()!);
  /** The booking an admin opened from the calendar, by id, so a moved booking shows its new times. */
  protected readonly openedBookingId = signal<number | null>(null);
  protected readonly openedBooking = computed(() => this.calendar()?.days.flatMap((day) => day.holds).find((hold) => hold.booking.id === this.openedBookingId())?.booking ?? null);

  ngOnInit(): void {
    this.store.dispatch(KitRoomPageActions.opened({ today: this.todayIso() }));
  }

  protected changeView(view: CalendarView): void {
    this.store.dispatch(KitRoomPageActions.viewChanged({ view }));
  }

  protected stepPeriod(step: -1 | 1): void {
    const calendar = this.calendar();
    if (calendar) this.store.dispatch(KitRoomPageActions.periodChanged({ anchor: stepPeriod(calendar.view, calendar.anchor, step) }));
  }

  protected showToday(): void {
    this.store.dispatch(KitRoomPageActions.periodChanged({ anchor: this.todayIso() }));
  }

  protected filterItem(kitItemId: number | null): void {
    this.store.dispatch(KitRoomPageActions.itemFilterChanged({ kitItemId }));
  }

  protected book(request: CreateBookingRequest): void {
    this.store.dispatch(KitRoomPageActions.bookingSubmitted({ request }));
  }

  protected cancel(bookingId: number): void {
    this.store.dispatch(KitRoomPageActions.bookingCancelled({ bookingId }));
  }

  protected openBooking(booking: Booking): void {
    this.openedBookingId.set(booking.id);
  }

  protected moveBooking(move: { bookingId: number; request: MoveBookingRequest }): void {
    this.store.dispatch(KitRoomPageActions.bookingMoveSubmitted(move));
  }

  protected cancelOpened(bookingId: number): void {
    this.openedBookingId.set(null);
    this.store.dispatch(KitRoomPageActions.bookingCancelled({ bookingId }));
  }

  protected requestFeedLink(): void {
    this.store.dispatch(KitRoomPageActions.feedLinkRequested());
  }

  protected revokeFeedLink(): void {
    this.store.dispatch(KitRoomPageActions.feedLinkRevoked());
  }
}
