import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { Booking, BookingFeedLink, BookingFeedLinkStatus } from '@shared/bookings';
import { KitItem, KitItemSummary, MaintenanceEntry } from '@shared/kit';
import { FieldErrors } from '@app/ui/server-field-errors';
import { NamedChoice } from '../named-choice';

export const KitRoomApiActions = createActionGroup({
  source: 'Kit Room API',
  events: {
    'Items Loaded Success': props<{ items: KitItemSummary[] }>(),
    'Items Loaded Failure': props<{ message: string }>(),
    'Bookings Loaded Success': props<{ bookings: Booking[] }>(),
    'Bookings Loaded Failure': props<{ message: string }>(),
    'My Bookings Loaded Success': props<{ bookings: Booking[] }>(),
    'My Bookings Loaded Failure': props<{ message: string }>(),
    'My Batches Loaded Success': props<{ batches: NamedChoice[] }>(),
    'People Loaded Success': props<{ people: NamedChoice[] }>(),
    'Booking Created Success': props<{ booking: Booking }>(),
    'Booking Created Failure': props<{ message: string; fields: FieldErrors | null }>(),
    'Booking Moved Success': props<{ booking: Booking }>(),
    'Booking Moved Failure': props<{ message: string }>(),
    'Booking Cancelled Success': props<{ bookingId: number }>(),
    'Booking Cancelled Failure': props<{ message: string }>(),
    'Feed Link Status Loaded': props<{ status: BookingFeedLinkStatus }>(),
    'Feed Link Issued Success': props<{ link: BookingFeedLink }>(),
    'Feed Link Revoked Success': emptyProps(),
    'Feed Link Failure': props<{ message: string }>(),
    'Item Saved Success': props<{ item: KitItem }>(),
    'Item Saved Failure': props<{ message: string; fields: FieldErrors | null }>(),
    'Maintenance Loaded Success': props<{ kitItemId: number; entries: MaintenanceEntry[] }>(),
    'Maintenance Loaded Failure': props<{ message: string }>(),
    'Maintenance Recorded Success': props<{ entry: MaintenanceEntry }>(),
    'Maintenance Recorded Failure': props<{ message: string; fields: FieldErrors | null }>(),
  },
});
