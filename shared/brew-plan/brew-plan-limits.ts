import { BOOKING_LIMITS } from '../bookings/booking-limits';

/** Limits of the brew plan, read by the server's schemas and the client's validators alike. */
export const BREW_PLAN_LIMITS = {
  fermentationDays: { min: 1, max: 60 },
  conditioningDays: { min: 0, max: 60 },
  /** The whole schedule is one fermenter booking, so it obeys the booking's longest span. */
  maxTotalDays: BOOKING_LIMITS.maxDurationDays,
  /** Weeks the planner looks ahead of the wanted week for a free slot. */
  searchWeeks: 26,
  /** Weeks one timeline request may show. */
  timelineWeeks: { min: 1, max: 26 },
} as const;
