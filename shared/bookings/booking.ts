/** Why an item is reserved: a member's use, or an admin's block for maintenance. */
export const BOOKING_PURPOSES = ['use', 'maintenance'] as const;
export type BookingPurpose = (typeof BOOKING_PURPOSES)[number];

/** A reservation of one kit item; the item stays held for cleaning until `heldUntil`. */
export interface Booking {
  id: number;
  kitItemId: number;
  kitItemCode: string;
  kitItemName: string;
  /** The person the booking is for. */
  userId: number;
  userName: string;
  purpose: BookingPurpose;
  /** Instants, ISO 8601 in UTC. */
  startsAt: string;
  endsAt: string;
  /** End of the cleaning turnaround that follows the booking (UTC). */
  heldUntil: string;
  /** Wall-clock start and end as booked, yyyy-MM-ddTHH:mm in `timeZone`. */
  startLocal: string;
  endLocal: string;
  timeZone: string;
  batchId: number | null;
  note: string;
  createdAt: string;
}
