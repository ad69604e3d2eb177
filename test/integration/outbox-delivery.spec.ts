import { randomUUID } from 'node:crypto';
import { createOutboxDispatcher, outboxRepository } from '@server/mail';
import { startMailCatcher } from '../../scripts/setup/mail-catcher';
import { ApiClient } from './helpers/api-client';
import { givePaidUpDues } from './helpers/dues-factory';
import { createKitItem, wallClockFromToday } from './helpers/kit-factory';
import { caughtMailTo } from './helpers/caught-mail';
import { startServerProcess } from './helpers/server-process';
import { createTestApp, TestApp, useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function waitForState(t: TestApp, id: number, state: string, timeoutMs: number): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if ((await t.db('outbox_messages').where({ id }).first())?.state === state) return;
    await pause(200);
  }
  throw new Error(`Message ${id} did not reach the state ${state} within ${timeoutMs} ms.`);
}

describe('Outbox delivery', () => {
  const t = useTestApp();

  it('when SMTP is down, then a booking confirmation waits in the outbox; once SMTP is back, two server processes deliver it exactly once', async () => {
    const catcher = await startMailCatcher({ smtpPort: 0, apiPort: 0 });
    await catcher.stopSmtp();
    const mailDown = createTestApp({ env: { SMTP_PORT: String(catcher.smtpPort) } });
    const member = await createUser(mailDown.db);
    await givePaidUpDues(mailDown.db, member.id);
    const item = await createKitItem(mailDown.db);
    const client = await ApiClient.signedIn(mailDown.app, member);
    const email = member.email;

    const booked = await client.send('post', '/api/bookings', { kitItemId: item.id, start: wallClockFromToday(t.config.coopTimeZone, 60, 9), end: wallClockFromToday(t.config.coopTimeZone, 61, 9) });
    const row = (await t.db('outbox_messages').where({ recipient: email }).first())!;
    expect(booked.status).toBe(201);
    expect(row).toMatchObject({ kind: 'booking-confirmation', state: 'queued' });

    expect(await mailDown.jobs.outbox.dispatchDue([row.id])).toBe(0);
    const failed = (await t.db('outbox_messages').where({ id: row.id }).first())!;
    expect(failed).toMatchObject({ state: 'failed', attempts: 1, last_error: expect.stringMatching(/ECONNREFUSED|connect/i) });
    expect(failed.next_attempt_at.getTime()).toBeGreaterThan(Date.now());
    mailDown.close();
    await mailDown.db.destroy();
    await catcher.stop();

    // SMTP is back (the catcher of `npm test`); an admin puts the message back in line; two real servers run their schedulers.
    const officer = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));
    expect((await officer.send('post', `/api/admin/mail/${row.id}/retry`)).status).toBe(200);
    const servers = await Promise.all([startServerProcess({ MAIL_DISPATCH_SECONDS: '1' }), startServerProcess({ MAIL_DISPATCH_SECONDS: '1' })]);
    try {
      await waitForState(t, row.id, 'sent', 90_000);
      await pause(2500);
    } finally {
      await Promise.all(servers.map((server) => server.stop()));
    }

    const caught = await caughtMailTo(email);
    expect(caught).toHaveLength(1);
    expect(caught[0].subject).toBe(`Booked: ${item.code} from ${booked.body.startLocal.replace('T', ' ')}`);
    expect(caught[0].text).toContain(item.code);
    expect(caught[0].html).toContain(item.code);
    expect((await t.db('outbox_messages').where({ id: row.id }).first())!.attempts).toBe(2);
  }, 240_000);

  it('when two dispatchers sweep the same outbox at once, then each message is sent once', async () => {
    const recipients = Array.from({ length: 12 }, () => `sweep-${randomUUID()}@test.example`);
    for (const to of recipients) await outboxRepository.enqueue(t.db, { kind: 'dues-receipt', to, subject: 'Test', text: 'Test', html: '<p>Test</p>' });
    const ids = (await t.db('outbox_messages').whereIn('recipient', recipients).select('id')).map((r) => r.id);
    const sent: string[] = [];
    const send = async (mail: { to: string }) => {
      await pause(5);
      sent.push(mail.to);
    };
    const one = createOutboxDispatcher({ db: t.db, send, holder: 'one' });
    const two = createOutboxDispatcher({ db: t.db, send, holder: 'two' });

    const counts = await Promise.all([one.dispatchDue(ids), two.dispatchDue(ids), one.dispatchDue(ids), two.dispatchDue(ids)]);

    expect(counts.reduce((a, b) => a + b, 0)).toBe(12);
    expect(sent.sort()).toEqual([...recipients].sort());
    expect(await t.db('outbox_messages').whereIn('id', ids).where({ state: 'sent' }).count({ n: '*' })).toEqual([{ n: 12 }]);
  });

  it('when an admin lists the outbox and opens a message, then state, attempts and both parts are shown', async () => {
    const to = `view-${randomUUID()}@test.example`;
    await outboxRepository.enqueue(t.db, { kind: 'dues-receipt', to, subject: 'Receipt', text: 'plain words', html: '<p>html words</p>' });
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));

    const list = await admin.get('/api/admin/mail');
    const summary = list.body.find((m: { recipient: string }) => m.recipient === to);
    const detail = await admin.get(`/api/admin/mail/${summary.id}`);

    expect(summary).toMatchObject({ state: 'queued', attempts: 0, lastError: null, kind: 'dues-receipt' });
    expect(detail.body).toMatchObject({ text: 'plain words', html: '<p>html words</p>' });
  });
});
