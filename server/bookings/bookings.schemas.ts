import { z } from 'zod';
import { BOOKING_LIMITS, BOOKING_PURPOSES, WALL_CLOCK_PATTERN } from '@shared/bookings';

const wallClock = z.string().regex(WALL_CLOCK_PATTERN, 'must be a date and time as yyyy-MM-ddTHH:mm');
const positiveId = z.number().int().positive();

export const createBookingSchema = z.strictObject({
  kitItemId: positiveId,
  start: wallClock,
  end: wallClock,
  note: z.string().trim().max(BOOKING_LIMITS.noteMaxLength).optional(),
  userId: positiveId.optional(),
  purpose: z.enum(BOOKING_PURPOSES).optional(),
  batchId: positiveId.optional(),
});

export const moveBookingSchema = z.strictObject({ start: wallClock, end: wallClock });

export const bookingRangeSchema = z.object({
  from: z.iso.date('a date as yyyy-MM-dd'),
  to: z.iso.date('a date as yyyy-MM-dd'),
  kitItemId: z.coerce.number().int().positive().optional(),
});

export const feedTokenSchema = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'is not a calendar link') });
