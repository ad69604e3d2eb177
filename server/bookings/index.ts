export { createBookingFeedService, type BookingFeedService } from './booking-feed.service';
export { createBookingsRouter } from './bookings.routes';
export { createBookingsService, type BookingsService, type BookingsServiceDeps } from './bookings.service';
export { everyoneMayBook, type DuesStanding, type DuesStandingResult } from './dues-standing';
export { createBookingNotices, type BookingNotices } from './booking-notices';
export { bookingsRepository } from './bookings.repository';
export { bookingWritesRepository } from './booking-writes.repository';
export { assertItemFree, lockBookableItem, type HolderRelease } from './booking-holds';
