import { Booking, BookingPurpose } from './booking';

export const BOOKINGS_PATH = '/api/bookings';

/*
 * Routes (roles in brackets; "any" = any signed-in person):
 *   GET    /api/bookings?from=&to=&kitItemId=     [any]    Booking[] held in [from, to) (wall-clock dates, co-op zone)
 *   GET    /api/bookings/mine                     [any]    Booking[] of the caller that have not ended
 *   POST   /api/bookings                          [any]    CreateBookingRequest → Booking (201); 409 booking-conflict
 *   PATCH  /api/bookings/:bookingId               [admin]  MoveBookingRequest → Booking; 409 booking-conflict
 *   DELETE /api/bookings/:bookingId               [owner, admin]  cancels (204)
 *   GET    /api/bookings/feed-link                [any]    BookingFeedLinkStatus
 *   POST   /api/bookings/feed-link                [any]    → BookingFeedLink (201; any earlier link stops working)
 *   DELETE /api/bookings/feed-link                [any]    revokes the link (204)
 *   GET    /api/bookings/feed/:token              [public, by secret link]  text/calendar of the person's bookings
 */

export interface CreateBookingRequest {
  kitItemId: number;
  /** Wall-clock times in the co-op's zone: yyyy-MM-ddTHH:mm. */
  start: string;
  end: string;
  note?: string;
  /** Admins only: book for someone else. */
  userId?: number;
  /** Admins only: 'maintenance' blocks the item. */
  purpose?: BookingPurpose;
  /** One of the booked person's batches that the booking serves. */
  batchId?: number;
}

export interface MoveBookingRequest {
  start: string;
  end: string;
}

/** What a 409 names: the reservation the request ran into, or the batch fermenting in the item. */
export type BookingConflict =
  | { kind: 'booking'; id: number; kitItemCode: string; userName: string; startsAt: string; heldUntil: string }
  | { kind: 'batch'; id: number; kitItemCode: string; batchName: string };

export interface BookingFeedLinkStatus {
  active: boolean;
  issuedAt: string | null;
}

export interface BookingFeedLink {
  /** Secret address for a calendar app; shown once. */
  url: string;
  issuedAt: string;
}

export type { Booking };
