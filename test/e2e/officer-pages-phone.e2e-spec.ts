import { randomUUID } from 'node:crypto';
import { DateTime } from 'luxon';
import { Page } from 'playwright-core';
import { loadConfig } from '@server/config';
import { createPlan, givePaidUpDues, paidThroughOf } from '../integration/helpers/dues-factory';
import { createUser } from '../integration/helpers/user-factory';
import { newPage } from './helpers/browser';
import { duesLedgerPage, outboxPage } from './helpers/dues-pages';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { kitRoomPage } from './helpers/kit-room-pages';
import { signInPage } from './helpers/pages';
import { inSight, pageWidth, PHONE } from './helpers/phone';

describe("The officer's pages on a 375 px phone", () => {
  const env = useE2eEnvironment();

  async function signInOfficer(): Promise<{ page: Page; close(): Promise<void> }> {
    const admin = await createUser(env.server.db, ['member', 'admin']);
    const { context, page } = await newPage(env.browser, env.server.baseUrl, PHONE);
    await signInPage.signIn(page, admin.email, admin.password);
    await page.waitForURL(/\/today/);
    return { page, close: () => context.close() };
  }

  it("when an officer opens the dues ledger on a phone, then a member's paid-through date, standing and payment amount are in sight and nothing scrolls sideways", async () => {
    const tag = randomUUID().slice(0, 8);
    const plan = await createPlan(env.server.db);
    const member = await createUser(env.server.db, ['member'], { name: `Ledger Linnet ${tag}` });
    await givePaidUpDues(env.server.db, member.id, 60);
    const paidThrough = (await paidThroughOf(env.server.db, member.id))!;
    await env.server.db('dues_payments').insert({
      user_id: member.id, plan_id: plan.id, plan_name: plan.name, amount_cents: 1200, currency: 'EUR', method: 'cash', kind: 'payment',
      recorded_by_user_id: null, note: '', stripe_charge_id: null, previous_paid_through: null, idempotency_key: `phone-${tag}`,
      period_start: DateTime.fromISO(paidThrough).minus({ months: 1 }).toISODate()!, period_end: paidThrough,
    });
    const officer = await signInOfficer();
    await duesLedgerPage.open(officer.page);

    const memberRow = officer.page.getByRole('row').filter({ hasText: `Ledger Linnet ${tag}` }).filter({ hasText: 'Paid up' });
    await memberRow.waitFor();
    expect(await inSight(memberRow.getByText(paidThrough))).toBe(true);
    expect(await inSight(memberRow.getByText('Paid up'))).toBe(true);
    const paymentRow = officer.page.getByRole('row').filter({ hasText: plan.name });
    expect(await inSight(paymentRow.getByText('12.00'))).toBe(true);
    expect(await pageWidth(officer.page)).toBeLessThanOrEqual(PHONE.width);
    await officer.close();
  }, 120_000);

  it("when an officer opens the kit room on a phone, then a booking's hours in the calendar are in sight and nothing scrolls sideways", async () => {
    const zone = loadConfig().coopTimeZone;
    const code = `P${Date.now() % 100000}`;
    const [itemId] = await env.server.db('kit_items').insert({ code, name: 'Phone test fermenter', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 0 });
    const member = await createUser(env.server.db, ['member'], { name: 'Pocket Plover' });
    const day = DateTime.now().setZone(zone).startOf('week').plus({ weeks: 1, days: 2 });
    const starts = day.set({ hour: 9 });
    await env.server.db('bookings').insert({
      kit_item_id: itemId, user_id: member.id, created_by_user_id: member.id, purpose: 'use', batch_id: null, note: '', time_zone: zone,
      starts_at: starts.toJSDate(), ends_at: starts.plus({ hours: 8 }).toJSDate(), held_until: starts.plus({ hours: 8 }).toJSDate(),
    });
    const officer = await signInOfficer();
    await kitRoomPage.open(officer.page);
    await kitRoomPage.showLaterPeriod(officer.page);

    const hold = officer.page.locator(`[data-day="${day.toISODate()}"]`).getByRole('button', { name: `${code} · Pocket Plover · 09:00–17:00` });
    await hold.waitFor();
    expect(await inSight(hold)).toBe(true);
    expect(await inSight(officer.page.getByRole('button', { name: 'Later' }))).toBe(true);
    expect(await pageWidth(officer.page)).toBeLessThanOrEqual(PHONE.width);
    await officer.close();
  }, 120_000);

  it("when an officer opens the outbox on a phone, then a message's state, attempts and last error are in sight and nothing scrolls sideways", async () => {
    const tag = randomUUID().slice(0, 8);
    const subject = `Booking confirmed: phone check ${tag}`;
    // A message that failed three times and waits a day for its next try, so no dispatcher touches it meanwhile.
    const [id] = await env.server.db('outbox_messages').insert({
      kind: 'booking-confirmation', recipient: `phone-${tag}@test.example`, subject, text_body: 'Text part', html_body: '<p>HTML part</p>',
    });
    await env.server.db('outbox_messages').where({ id }).update({
      state: 'failed', attempts: 3, last_error: 'connect ECONNREFUSED 127.0.0.1:2525', next_attempt_at: DateTime.now().plus({ days: 1 }).toJSDate(),
    });
    const officer = await signInOfficer();
    await outboxPage.open(officer.page);

    const row = officer.page.getByRole('row').filter({ hasText: subject });
    await row.waitFor();
    expect(await inSight(row.getByText('Failed, will retry'))).toBe(true);
    expect(await inSight(row.getByText('3', { exact: true }))).toBe(true);
    expect(await inSight(row.getByText('ECONNREFUSED'))).toBe(true);
    expect(await inSight(row.getByRole('button', { name: `Show the message ${subject} to phone-${tag}@test.example` }))).toBe(true);
    expect(await pageWidth(officer.page)).toBeLessThanOrEqual(PHONE.width);
    await officer.close();
  }, 120_000);
});
