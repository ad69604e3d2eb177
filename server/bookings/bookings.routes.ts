import { Router } from 'express';
import { publicRoute, requireRole, signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { BookingFeedService } from './booking-feed.service';
import { bookingRangeSchema, createBookingSchema, feedTokenSchema, moveBookingSchema } from './bookings.schemas';
import { BookingsService } from './bookings.service';

/** /api/bookings: members book for themselves; admins book for anyone, move and block. */
export function createBookingsRouter(bookings: BookingsService, feed: BookingFeedService): Router {
  const router = Router();
  const bookingId = (params: Record<string, unknown>) => parseId(params.bookingId, 'bookingId');

  router.get('/', signedIn, async (req, res) => {
    const { from, to, kitItemId } = parseRequest(bookingRangeSchema, req.query);
    res.json(await bookings.listHeldBetween(from, to, kitItemId));
  });

  router.get('/mine', signedIn, async (req, res) => {
    res.json(await bookings.mine(req.user!));
  });

  router.post('/', signedIn, async (req, res) => {
    res.status(201).json(await bookings.create(req.user!, parseRequest(createBookingSchema, req.body)));
  });

  router.get('/feed-link', signedIn, async (req, res) => {
    res.json(await feed.status(req.user!));
  });

  router.post('/feed-link', signedIn, async (req, res) => {
    res.status(201).json(await feed.issue(req.user!));
  });

  router.delete('/feed-link', signedIn, async (req, res) => {
    await feed.revoke(req.user!);
    res.status(204).end();
  });

  // Calendar apps cannot sign in: the secret in the link is the credential.
  router.get('/feed/:token', publicRoute, async (req, res) => {
    const { token } = parseRequest(feedTokenSchema, req.params);
    res.type('text/calendar; charset=utf-8').set('Cache-Control', 'private, no-store').send(await feed.calendar(token));
  });

  router.patch('/:bookingId', requireRole('admin'), async (req, res) => {
    res.json(await bookings.move(req.user!, bookingId(req.params), parseRequest(moveBookingSchema, req.body)));
  });

  router.delete('/:bookingId', signedIn, async (req, res) => {
    await bookings.cancel(req.user!, bookingId(req.params));
    res.status(204).end();
  });

  return router;
}
