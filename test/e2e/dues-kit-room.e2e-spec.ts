import { DateTime } from 'luxon';
import { loadConfig } from '@server/config';
import { givePaidUpDues } from '../integration/helpers/dues-factory';
import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { kitRoomPage } from './helpers/kit-room-pages';
import { outboxPage } from './helpers/dues-pages';
import { signInPage } from './helpers/pages';

describe('Dues standing in the kit room, in the browser', () => {
  const env = useE2eEnvironment();

  async function fermenterF2(): Promise<void> {
    const existing = await env.server.db('kit_items').where({ code: 'F2' }).first('id');
    if (!existing) await env.server.db('kit_items').insert({ code: 'F2', name: 'Conical fermenter 2', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 24 });
  }
  const zone = () => loadConfig().coopTimeZone;

  /** Sends due mail until the member's confirmation has gone; the server's own schedule may be sending it at the same moment. */
  async function sendConfirmationTo(recipient: string): Promise<void> {
    for (let attempt = 0; attempt < 100; attempt++) {
      await env.server.jobs.outbox.dispatchDue();
      const message = await env.server.db('outbox_messages').where({ kind: 'booking-confirmation', recipient }).first('state');
      if (message?.state === 'sent') return;
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
    throw new Error(`The booking confirmation to ${recipient} was not sent within 20 s.`);
  }

  it('when a member whose dues lapsed tries to book, then the booking is refused with the reason and how to pay, and nothing is booked', async () => {
    await fermenterF2();
    const member = await createUser(env.server.db, ['member'], { name: 'Lapsed Lark' });
    await givePaidUpDues(env.server.db, member.id, -3);
    const day = DateTime.now().setZone(zone()).plus({ days: 70 }).toISODate()!;
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);

    await kitRoomPage.open(page);
    await kitRoomPage.book(page, 'F2', { date: day, time: '09:00' }, { date: day, time: '17:00' });

    const alert = page.getByRole('alert').filter({ hasText: 'lapsed' });
    await alert.waitFor();
    expect(await alert.textContent()).toMatch(/paid through \d{4}-\d\d-\d\d, so they have lapsed.*Dues page/);
    expect(await env.server.db('bookings').where({ user_id: member.id })).toEqual([]);
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 90_000);

  it('when a paid-up member books, then an admin sees the booking confirmation in the outbox and reads it as sent', async () => {
    await fermenterF2();
    const member = await createUser(env.server.db, ['member'], { name: 'Paid Plover' });
    await givePaidUpDues(env.server.db, member.id);
    const day = DateTime.now().setZone(zone()).plus({ days: 75 }).toISODate()!;
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await kitRoomPage.open(page);
    await kitRoomPage.book(page, 'F2', { date: day, time: '09:00' }, { date: day, time: '17:00' });
    await kitRoomPage.myBookings(page).getByText('F2').waitFor();
    await context.close();
    await sendConfirmationTo(member.email);

    const admin = await createUser(env.server.db, ['member', 'admin']);
    const officer = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(officer.page, admin.email, admin.password);
    await officer.page.waitForURL(/\/today/);
    await outboxPage.open(officer.page);
    await outboxPage.show(officer.page, `Booked: F2 from ${day} 09:00`, member.email);
    expect(await officer.page.getByTestId('mail-preview').textContent()).toContain('booking-confirmation · sent');
    await officer.context.close();
  }, 120_000);
});
