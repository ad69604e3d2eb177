import { ApiClient } from './helpers/api-client';
import { createPaidUpUser, givePaidUpDues } from './helpers/dues-factory';
import { createKitItem, wallClockFromToday } from './helpers/kit-factory';
import { testConfig, useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Bookings and dues', () => {
  const t = useTestApp();
  const zone = testConfig().coopTimeZone;
  const day = (days: number, hour: number) => wallClockFromToday(zone, days, hour);

  it('when dues lapse, then a new booking is refused saying why and how to pay, and the booking made before stays', async () => {
    const item = await createKitItem(t.db);
    const user = await createPaidUpUser(t.db);
    const client = await ApiClient.signedIn(t.app, user);
    const before = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(10, 9), end: day(11, 9) });
    await givePaidUpDues(t.db, user.id, -2);

    const refused = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(20, 9), end: day(21, 9) });

    expect(before.status).toBe(201);
    expect(refused.status).toBe(403);
    expect(refused.body.error).toMatchObject({ code: 'dues-lapsed', message: expect.stringMatching(/paid through \d{4}-\d\d-\d\d, so they have lapsed.*Dues page \(\/dues\)/) });
    expect((await client.get('/api/bookings/mine')).body.map((b: { id: number }) => b.id)).toEqual([before.body.id]);
    expect(await t.db('bookings').where({ user_id: user.id }).count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('when a member with lapsed dues still holds a booking, then the admins are told once', async () => {
    const item = await createKitItem(t.db);
    const user = await createUser(t.db, ['member'], { name: 'Lapsed Holder' });
    const admin = await createUser(t.db, ['member', 'admin']);
    await givePaidUpDues(t.db, user.id);
    await (await ApiClient.signedIn(t.app, user)).send('post', '/api/bookings', { kitItemId: item.id, start: day(12, 9), end: day(13, 9) });
    await givePaidUpDues(t.db, user.id, -1);

    await t.jobs.dues.sendOverdueReminders();
    await t.jobs.dues.sendOverdueReminders();

    const told = await t.db('outbox_messages').where({ recipient: admin.email, kind: 'dues-lapsed-bookings' }).where('text_body', 'like', `%${user.email}%`);
    expect(told).toHaveLength(1);
    expect(told[0].subject).toBe('Dues lapsed: Lapsed Holder has 1 booking(s) ahead');
  });

  it('when a member books, then a confirmation is queued with the booking; the day before, one reminder however often the job runs', async () => {
    const item = await createKitItem(t.db, { turnaroundHours: 12 });
    const user = await createPaidUpUser(t.db);
    const client = await ApiClient.signedIn(t.app, user);

    const booked = await client.send('post', '/api/bookings', { kitItemId: item.id, start: day(1, 10), end: day(1, 18) });
    await t.jobs.bookingReminders.remindTomorrow();
    await t.jobs.bookingReminders.remindTomorrow();

    expect(booked.status).toBe(201);
    const mails = await t.db('outbox_messages').where({ recipient: user.email }).orderBy('id');
    expect(mails.map((m) => m.kind)).toEqual(['booking-confirmation', 'booking-reminder']);
    expect(mails[0].subject).toBe(`Booked: ${item.code} from ${day(1, 10).replace('T', ' ')}`);
    expect(mails[0].text_body).toContain('Cleaning after: 12 h');
    expect(mails[1].subject).toContain('Tomorrow');
  });

  it('when a booking is refused for an overlap, then no confirmation is queued', async () => {
    const item = await createKitItem(t.db);
    const [first, second] = await Promise.all([createUser(t.db), createUser(t.db)]);
    await givePaidUpDues(t.db, first.id);
    await givePaidUpDues(t.db, second.id);
    await (await ApiClient.signedIn(t.app, first)).send('post', '/api/bookings', { kitItemId: item.id, start: day(30, 9), end: day(31, 9) });

    const clash = await (await ApiClient.signedIn(t.app, second)).send('post', '/api/bookings', { kitItemId: item.id, start: day(30, 12), end: day(31, 12) });

    expect(clash.status).toBe(409);
    expect(await t.db('outbox_messages').where({ recipient: second.email })).toEqual([]);
  });
});
