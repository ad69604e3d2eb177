import { DateTime } from 'luxon';
import { createDuesStanding } from '@server/dues';
import { ApiClient } from './helpers/api-client';
import { waitForMailTo } from './helpers/caught-mail';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

const zone = process.env.COOP_TIME_ZONE ?? 'Europe/Berlin';
const day = (offset: number) => DateTime.now().setZone(zone).plus({ days: offset }).toISODate()!;

describe('Dues standing and reminders', () => {
  const t = useTestApp();
  const standing = () => createDuesStanding({ db: t.db, coopTimeZone: zone });

  it('when dues cover today, then the member may book', async () => {
    const user = await createUser(t.db);
    await t.db('dues_memberships').insert({ user_id: user.id, paid_through: day(0) });

    await expect(standing().assertMayBook(user.id)).resolves.toBeUndefined();
  });

  it('when dues have lapsed, then booking is refused with the date, the reason and how to pay', async () => {
    const user = await createUser(t.db);
    await t.db('dues_memberships').insert({ user_id: user.id, paid_through: day(-1) });

    await expect(standing().assertMayBook(user.id)).rejects.toMatchObject({
      status: 403,
      code: 'dues-lapsed',
      message: expect.stringMatching(new RegExp(`paid through ${day(-1)}.*Dues page`)),
    });
  });

  it('when a member never paid, then booking is refused too', async () => {
    const user = await createUser(t.db);

    await expect(standing().assertMayBook(user.id)).rejects.toMatchObject({ code: 'dues-lapsed', message: expect.stringContaining('no dues payment') });
  });

  it('when dues lapse, then the member gets one overdue reminder however often the job runs, and it reaches the SMTP catcher', async () => {
    const user = await createUser(t.db);
    await t.db('dues_memberships').insert({ user_id: user.id, paid_through: day(-3) });

    await t.jobs.dues.sendOverdueReminders();
    await t.jobs.dues.sendOverdueReminders();

    const rows = await t.db('outbox_messages').where({ recipient: user.email, kind: 'dues-overdue' });
    expect(rows).toHaveLength(1);
    const mail = await waitForMailTo(user.email, () => t.jobs.outbox.dispatchDue([rows[0].id]));
    expect(mail.subject).toBe('Your co-op dues are overdue');
    expect(mail.text).toContain(`paid through ${day(-3)}`);
  });

  it('when a member asks for a new password, then a one-time link is mailed and it works', async () => {
    const user = await createUser(t.db);
    const guest = await ApiClient.anonymous(t.app);

    expect((await guest.send('post', '/api/password-resets/requests', { email: user.email })).status).toBe(202);

    const row = (await t.db('outbox_messages').where({ recipient: user.email, kind: 'password-reset' }).first())!;
    const mail = await waitForMailTo(user.email, () => t.jobs.outbox.dispatchDue([row.id]));
    const token = /\/reset-password\/([A-Za-z0-9_-]+)/.exec(mail.text)![1];
    expect((await guest.send('post', '/api/password-resets', { token, password: 'a brand new password' })).status).toBe(204);
  });
});
