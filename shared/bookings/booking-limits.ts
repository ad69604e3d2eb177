/** Limits of a booking, read by the server's schemas and the client's validators alike. */
export const BOOKING_LIMITS = {
  /** A fermenter may be held for a long lager; longer than this is a register change, not a booking. */
  maxDurationDays: 90,
  /** How far ahead the calendar takes bookings. */
  maxDaysAhead: 365,
  /** Shortest booking, in minutes. */
  minDurationMinutes: 30,
  noteMaxLength: 500,
  /** Widest calendar range one request may ask for. */
  maxRangeDays: 62,
} as const;
