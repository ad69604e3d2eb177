import { ChangeDetectionStrategy, Component, computed, inject, OnInit } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { DateTime } from 'luxon';
import { CreateBookingRequest } from '@shared/bookings';
import { authFeature } from '@app/auth/state/auth.feature';
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
  imports: [BookingCalendar, BookingForm, MyBookings, FeedLinkPanel, RouterLink, MatButton, MatIcon],
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

  protected requestFeedLink(): void {
    this.store.dispatch(KitRoomPageActions.feedLinkRequested());
  }

  protected revokeFeedLink(): void {
    this.store.dispatch(KitRoomPageActions.feedLinkRevoked());
  }
}
