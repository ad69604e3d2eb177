export * from './booking';
export * from './booking-limits';
export * from './bookings-api';
export * from './held-interval';
export * from './wall-clock';
