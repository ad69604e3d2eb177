import { DateTime } from 'luxon';
import { loadConfig } from '@server/config';
import { givePaidUpDues } from '../integration/helpers/dues-factory';
import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { kitRoomPage } from './helpers/kit-room-pages';
import { signInPage } from './helpers/pages';
import { dismissSnackBar } from './helpers/recipes-pages';

describe('Kit room in the browser', () => {
  const env = useE2eEnvironment();

  /** The co-op's F2 as the register holds it; added when this database has no F2 yet. */
  async function fermenterF2(): Promise<void> {
    const existing = await env.server.db('kit_items').where({ code: 'F2' }).first('id');
    if (!existing) await env.server.db('kit_items').insert({ code: 'F2', name: 'Conical fermenter 2', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 24 });
  }

  it('when a member books F2 for next week, then the booking shows in the calendar and in my bookings', async () => {
    await fermenterF2();
    const member = await createUser(env.server.db, ['member'], { name: 'Nell Kitroom' });
    await givePaidUpDues(env.server.db, member.id);
    const zone = loadConfig().coopTimeZone;
    const nextMonday = DateTime.now().setZone(zone).startOf('week').plus({ weeks: 1 });
    const startDay = nextMonday.plus({ days: 1 }).toISODate()!;
    const endDay = nextMonday.plus({ days: 3 }).toISODate()!;
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);

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
  }, 90_000);
});
