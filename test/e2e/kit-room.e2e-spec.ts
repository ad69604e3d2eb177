import { DateTime } from 'luxon';
import { loadConfig } from '@server/config';
import { createPlan, givePaidUpDues } from '../integration/helpers/dues-factory';
import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { duesPage } from './helpers/dues-pages';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { kitRoomPage } from './helpers/kit-room-pages';
import { signInPage } from './helpers/pages';
import { dismissSnackBar } from './helpers/recipes-pages';

describe('Kit room in the browser', () => {
  const env = useE2eEnvironment();
  const zone = () => loadConfig().coopTimeZone;

  /** The co-op's F2 as the register holds it; added when this database has no F2 yet. */
  async function fermenterF2(): Promise<void> {
    const existing = await env.server.db('kit_items').where({ code: 'F2' }).first('id');
    if (!existing) await env.server.db('kit_items').insert({ code: 'F2', name: 'Conical fermenter 2', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 24 });
  }

  it('when a member pays dues with a test card and books F2 for next week, then the booking shows in the calendar and in my bookings', async () => {
    await fermenterF2();
    const plan = await createPlan(env.server.db);
    const member = await createUser(env.server.db, ['member'], { name: 'Nell Kitroom' });
    const nextMonday = DateTime.now().setZone(zone()).startOf('week').plus({ weeks: 1 });
    const startDay = nextMonday.plus({ days: 1 }).toISODate()!;
    const endDay = nextMonday.plus({ days: 3 }).toISODate()!;
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);

    await duesPage.open(page);
    await duesPage.pay(page, plan.name, 'Test Visa ending 4242');
    await duesPage.paidThrough(page).waitFor();
    await kitRoomPage.open(page);
    await kitRoomPage.book(page, 'F2', { date: startDay, time: '10:00' }, { date: endDay, time: '18:00' });
    await kitRoomPage.myBookings(page).getByText('F2').waitFor();
    await kitRoomPage.showLaterPeriod(page);

    expect(await kitRoomPage.holdsOn(page, startDay)).toContain('F2 · Nell Kitroom · from 10:00');
    expect(await kitRoomPage.holdsOn(page, endDay)).toContain('F2 · Nell Kitroom · until 18:00');
    expect(await kitRoomPage.holdsOn(page, nextMonday.plus({ days: 4 }).toISODate()!)).toContain('F2 · Nell Kitroom · cleaning until 18:00');
    expect(await kitRoomPage.myBookings(page).textContent()).toContain(`${startDay} 10:00 – ${endDay} 18:00`);
    await dismissSnackBar(page);
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 120_000);

  it('when an admin moves a booking with the date picker, then the calendar shows it on its new days in the co-op zone', async () => {
    const [itemId] = await env.server.db('kit_items').insert({ code: `M${Date.now() % 100000}`, name: 'Move test fermenter', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 0 });
    const item = await env.server.db('kit_items').where({ id: itemId }).first('code');
    const member = await createUser(env.server.db, ['member'], { name: 'Moss Mover' });
    await givePaidUpDues(env.server.db, member.id);
    const nextMonday = DateTime.now().setZone(zone()).startOf('week').plus({ weeks: 1 });
    const starts = nextMonday.set({ hour: 9 });
    await env.server.db('bookings').insert({
      kit_item_id: itemId, user_id: member.id, created_by_user_id: member.id, purpose: 'use', batch_id: null, note: '', time_zone: zone(),
      starts_at: starts.toJSDate(), ends_at: starts.plus({ hours: 8 }).toJSDate(), held_until: starts.plus({ hours: 8 }).toJSDate(),
    });
    const admin = await createUser(env.server.db, ['member', 'admin']);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, admin.email, admin.password);
    await page.waitForURL(/\/today/);
    await kitRoomPage.open(page);
    await kitRoomPage.showLaterPeriod(page);

    await kitRoomPage.openHold(page, nextMonday.toISODate()!, `${item!.code} · Moss Mover · 09:00–17:00`);
    const newStart = nextMonday.plus({ days: 2 });
    const newEnd = nextMonday.plus({ days: 3 });
    await kitRoomPage.moveOpened(page, { date: newStart.toISODate()!, time: '08:00' }, { pickDayLabel: newEnd.setLocale('en-US').toFormat('DDD'), time: '12:00' });

    await page.locator(`[data-day="${newEnd.toISODate()}"]`).getByRole('button', { name: `${item!.code} · Moss Mover · until 12:00` }).waitFor();
    const stored = await env.server.db('bookings').where({ kit_item_id: itemId }).first();
    expect(DateTime.fromJSDate(stored!.starts_at).setZone(zone()).toFormat("yyyy-MM-dd'T'HH:mm")).toBe(`${newStart.toISODate()}T08:00`);
    expect(DateTime.fromJSDate(stored!.ends_at).setZone(zone()).toFormat("yyyy-MM-dd'T'HH:mm")).toBe(`${newEnd.toISODate()}T12:00`);
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 120_000);
});
