import { DateTime } from 'luxon';
import { ApiClient } from './helpers/api-client';
import { createPaidUpUser } from './helpers/dues-factory';
import { createKitItem, wallClockFromToday } from './helpers/kit-factory';
import { testConfig, useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Bookings API', () => {
  const t = useTestApp();
  const zone = testConfig().coopTimeZone;

  const member = async () => ApiClient.signedIn(t.app, await createPaidUpUser(t.db));
  const day = (days: number, hour: number, minute = 0) => wallClockFromToday(zone, days, hour, minute);

  it('when a member books an item, then the booking keeps the wall-clock times and holds the turnaround after it', async () => {
    const item = await createKitItem(t.db, { turnaroundHours: 24 });
    const client = await member();

    const res = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(7, 10), end: day(9, 18), note: 'Pale ale' });

    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kitItemId: item.id, kitItemCode: item.code, startLocal: day(7, 10), endLocal: day(9, 18), timeZone: zone, purpose: 'use', note: 'Pale ale' });
    expect(Date.parse(res.body.heldUntil) - Date.parse(res.body.endsAt)).toBe(24 * 3_600_000);
    expect(await t.db('bookings').where({ kit_item_id: item.id })).toHaveLength(1);
  });

  it('when 50 overlapping requests for one item arrive at once, then exactly one succeeds and 49 answer 409 naming it', async () => {
    const item = await createKitItem(t.db);
    const clients = await Promise.all(Array.from({ length: 5 }, () => member()));

    const responses = await Promise.all(
      Array.from({ length: 50 }, (_, i) => clients[i % 5].send('post', '/api/bookings', { kitItemId: item.id, start: day(20, 8, i), end: day(21, 8, i) })),
    );

    const created = responses.filter((res) => res.status === 201);
    const refused = responses.filter((res) => res.status === 409);
    expect(created).toHaveLength(1);
    expect(refused).toHaveLength(49);
    for (const res of refused) {
      expect(res.body.error.code).toBe('booking-conflict');
      expect(res.body.error.details.conflict.id).toBe(created[0].body.id);
      expect(res.body.error.message).toContain(`booking #${created[0].body.id}`);
    }
    expect(await t.db('bookings').where({ kit_item_id: item.id })).toHaveLength(1);
  });

  it('when a booking spans the spring clock change, then both ends keep their wall-clock times (Directive 2000/84/EC: last Sunday of March, 01:00 UTC)', async () => {
    const item = await createKitItem(t.db);
    const client = await member();
    // The next spring change: the last Sunday of March after today.
    let year = DateTime.now().setZone(zone).year;
    const lastSundayOfMarch = (y: number) => DateTime.fromObject({ year: y, month: 3, day: 31 }, { zone }).minus({ days: DateTime.fromObject({ year: y, month: 3, day: 31 }).weekday % 7 });
    if (lastSundayOfMarch(year) < DateTime.now().setZone(zone).plus({ days: 2 })) year += 1;
    const sunday = lastSundayOfMarch(year);
    const start = sunday.minus({ days: 1 }).toFormat("yyyy-MM-dd'T'10:00");
    const end = sunday.plus({ days: 1 }).toFormat("yyyy-MM-dd'T'10:00");

    const res = await client.send('post', '/api/bookings', { kitItemId: item.id, start, end });

    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ startLocal: start, endLocal: end });
    const offsetHours = (iso: string) => DateTime.fromISO(iso, { zone }).offset / 60;
    expect(offsetHours(res.body.startsAt) + 1).toBe(offsetHours(res.body.endsAt));
    // 48 wall-clock hours are 47 elapsed hours when the clocks go forward in between.
    expect(Date.parse(res.body.endsAt) - Date.parse(res.body.startsAt)).toBe(47 * 3_600_000);
  });

  it('when a request touches an existing booking’s turnaround at either end, then it is refused; exactly touching is allowed', async () => {
    const item = await createKitItem(t.db, { turnaroundHours: 24 });
    const client = await member();
    const first = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(30, 10), end: day(31, 10) });
    expect(first.status).toBe(201);

    const intoTurnaround = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(32, 9), end: day(33, 9) });
    const turnaroundIntoIt = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(28, 10), end: day(29, 11) });
    const rightAfter = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(32, 10), end: day(33, 9) });
    const rightBefore = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(28, 10), end: day(29, 10) });

    expect(intoTurnaround.status).toBe(409);
    expect(intoTurnaround.body.error.details.conflict.id).toBe(first.body.id);
    expect(turnaroundIntoIt.status).toBe(409);
    expect(turnaroundIntoIt.body.error.details.conflict.id).toBe(first.body.id);
    expect(rightAfter.status).toBe(201);
    expect(rightBefore.status).toBe(201);
  });

  it('when an item is under maintenance or retired, then a booking is refused with 409', async () => {
    const client = await member();
    for (const state of ['maintenance', 'retired'] as const) {
      const item = await createKitItem(t.db, { state });
      const res = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(5, 10), end: day(6, 10) });
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('kit-unavailable');
    }
  });

  it('when times are impossible, then it answers 400 naming the field and stores nothing', async () => {
    const item = await createKitItem(t.db);
    const client = await member();

    const backwards = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(5, 10), end: day(5, 9) });
    const past = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(-2, 10), end: day(-1, 10) });
    const garbled = await client.send('post', '/api/bookings', { kitItemId: item.id, start: 'tomorrow', end: day(5, 9) });

    expect(backwards.status).toBe(400);
    expect(backwards.body.fields).toHaveProperty('end');
    expect(past.body.fields).toHaveProperty('start');
    expect(garbled.body.fields).toHaveProperty('start');
    expect(await t.db('bookings').where({ kit_item_id: item.id })).toHaveLength(0);
  });

  it('when a member cancels, then only their own booking goes and its slot is free again', async () => {
    const item = await createKitItem(t.db);
    const owner = await member();
    const other = await member();
    const booking = await owner.send('post', '/api/bookings', { kitItemId: item.id, start: day(12, 10), end: day(13, 10) });

    const byOther = await other.send('delete', `/api/bookings/${booking.body.id}`);
    const byOwner = await owner.send('delete', `/api/bookings/${booking.body.id}`);
    const again = await other.send('post', '/api/bookings', { kitItemId: item.id, start: day(12, 10), end: day(13, 10) });

    expect(byOther.status).toBe(403);
    expect(byOwner.status).toBe(204);
    expect(again.status).toBe(201);
    expect((await owner.get('/api/bookings/mine')).body).toEqual([]);
  });

  it('when an admin books for a member, moves, blocks and cancels, then members cannot do the same', async () => {
    const item = await createKitItem(t.db);
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));
    const person = await createPaidUpUser(t.db);
    const client = await ApiClient.signedIn(t.app, person);

    const forMember = await admin.send('post', '/api/bookings', { kitItemId: item.id, userId: person.id, start: day(40, 10), end: day(41, 10) });
    const block = await admin.send('post', '/api/bookings', { kitItemId: item.id, purpose: 'maintenance', start: day(45, 8), end: day(45, 17) });
    const moveIntoBlock = await admin.send('patch', `/api/bookings/${forMember.body.id}`, { start: day(45, 10), end: day(46, 10) });
    const moved = await admin.send('patch', `/api/bookings/${forMember.body.id}`, { start: day(42, 10), end: day(43, 10) });
    const memberBlocks = await client.send('post', '/api/bookings', { kitItemId: item.id, purpose: 'maintenance', start: day(50, 8), end: day(50, 17) });

    expect(forMember.status).toBe(201);
    expect(forMember.body.userId).toBe(person.id);
    expect(block.body).toMatchObject({ purpose: 'maintenance', heldUntil: block.body.endsAt });
    expect(moveIntoBlock.status).toBe(409);
    expect(moveIntoBlock.body.error.details.conflict.id).toBe(block.body.id);
    expect(moved.body).toMatchObject({ startLocal: day(42, 10), endLocal: day(43, 10) });
    expect(memberBlocks.status).toBe(403);
    expect((await client.get('/api/bookings/mine')).body.map((b: { id: number }) => b.id)).toEqual([forMember.body.id]);

    const cancelledByAdmin = await admin.send('delete', `/api/bookings/${forMember.body.id}`);
    expect(cancelledByAdmin.status).toBe(204);
    expect((await client.get('/api/bookings/mine')).body).toEqual([]);
  });

  it('when the calendar asks for a range, then it lists the holds of that range for the item', async () => {
    const item = await createKitItem(t.db);
    const client = await member();
    const booking = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(14, 10), end: day(15, 10) });
    const from = day(13, 0).slice(0, 10);
    const to = day(16, 0).slice(0, 10);

    const listed = await client.get(`/api/bookings?from=${from}&to=${to}&kitItemId=${item.id}`);
    const tooWide = await client.get(`/api/bookings?from=${from}&to=${day(200, 0).slice(0, 10)}`);

    expect(listed.body.map((b: { id: number }) => b.id)).toEqual([booking.body.id]);
    expect(tooWide.status).toBe(400);
    expect(tooWide.body.fields).toHaveProperty('to');
  });

  it('when a member subscribes to the calendar feed, then the private link serves their bookings until replaced or revoked', async () => {
    const item = await createKitItem(t.db);
    const client = await member();
    await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(9, 10), end: day(10, 10) });

    const first = await client.send('post', '/api/bookings/feed-link');
    const feedPath = (url: string) => new URL(url).pathname;
    const calendar = await client.get(feedPath(first.body.url));
    const second = await client.send('post', '/api/bookings/feed-link');
    const oldLink = await client.get(feedPath(first.body.url));
    await client.send('delete', '/api/bookings/feed-link');
    const revoked = await client.get(feedPath(second.body.url));

    expect(calendar.status).toBe(200);
    expect(calendar.headers['content-type']).toContain('text/calendar');
    expect(calendar.text).toContain('BEGIN:VEVENT');
    expect(calendar.text).toContain(item.code);
    expect(oldLink.status).toBe(404);
    expect(revoked.status).toBe(404);
    expect((await client.get('/api/bookings/feed-link')).body).toEqual({ active: false, issuedAt: null });
  });
});
