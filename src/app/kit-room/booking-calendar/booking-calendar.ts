import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonToggle, MatButtonToggleGroup } from '@angular/material/button-toggle';
import { MatIconButton, MatButton } from '@angular/material/button';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatOption, MatSelect } from '@angular/material/select';
import { DatePipe } from '@angular/common';
import { Booking } from '@shared/bookings';
import { KitItemSummary } from '@shared/kit';
import { CalendarView } from '../calendar-period';
import { DayHold } from '../day-holds';

/** What the calendar shows: a titled period of days with the holds on each. */
export interface CalendarViewModel {
  view: CalendarView;
  anchor: string;
  itemFilter: number | null;
  title: string;
  days: { day: string; holds: DayHold[] }[];
}

/** The room's calendar (or one item's) by week or month; cleaning turnarounds are shown apart from use. */
@Component({
  selector: 'cw-booking-calendar',
  imports: [MatButtonToggleGroup, MatButtonToggle, MatIconButton, MatButton, MatIcon, MatFormField, MatLabel, MatSelect, MatOption, DatePipe],
  templateUrl: './booking-calendar.html',
  styleUrl: './booking-calendar.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookingCalendar {
  readonly calendar = input.required<CalendarViewModel>();
  readonly items = input.required<KitItemSummary[]>();
  readonly today = input.required<string>();
  readonly viewChanged = output<CalendarView>();
  readonly periodStepped = output<-1 | 1>();
  readonly todayRequested = output<void>();
  readonly itemFilterChanged = output<number | null>();
  /** Admins may open a booking from the calendar; for others the holds are plain text. */
  readonly selectable = input(false);
  readonly bookingSelected = output<Booking>();

  protected readonly weekdays = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];
  protected readonly hasHolds = computed(() => this.calendar().days.some((cell) => cell.holds.length > 0));
}
