import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { CreateBookingRequest, MoveBookingRequest } from '@shared/bookings';
import { CalendarView } from '../calendar-period';

export const KitRoomPageActions = createActionGroup({
  source: 'Kit Room Page',
  events: {
    Opened: props<{ today: string }>(),
    'View Changed': props<{ view: CalendarView }>(),
    'Period Changed': props<{ anchor: string }>(),
    'Item Filter Changed': props<{ kitItemId: number | null }>(),
    'Booking Submitted': props<{ request: CreateBookingRequest }>(),
    'Booking Move Submitted': props<{ bookingId: number; request: MoveBookingRequest }>(),
    'Booking Cancelled': props<{ bookingId: number }>(),
    'Feed Link Requested': emptyProps(),
    'Feed Link Revoked': emptyProps(),
  },
});
