import { parse } from 'csv-parse/sync';
import { DateTime } from 'luxon';
import { loadConfig } from '@server/config';
import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { signInPage } from './helpers/pages';
import { productionReportPage } from './helpers/production-report-pages';

describe('Production report in the browser', () => {
  const env = useE2eEnvironment();

  it('when an admin opens the production report, then this month’s batch shows in the table and the CSV downloads with its columns', async () => {
    const zone = loadConfig().coopTimeZone;
    const code = `P${Date.now() % 100000}`;
    const [fermenterId] = await env.server.db('kit_items').insert({ code, name: 'Report fermenter', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 24 });
    const admin = await createUser(env.server.db, ['member', 'admin']);
    const monthStart = DateTime.now().setZone(zone).startOf('month');
    await env.server.db('batches').insert({
      name: 'Report journey ale (invented)', brewer_user_id: admin.id, created_by_user_id: admin.id, brew_date: monthStart.toJSDate(), planned_volume_litres: 21,
      fermenter_kit_item_id: fermenterId, status: 'fermenting', brewing_at: monthStart.toJSDate(), fermenting_at: monthStart.toJSDate(),
    });
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, admin.email, admin.password);
    await page.waitForURL(/\/today/);

    await productionReportPage.openFromBrewPlan(page);
    const thisMonth = `${monthStart.setLocale('en-US').toFormat('LLL yyyy')} (so far)`;
    const row = await productionReportPage.monthRow(page, thisMonth);
    const csv = await productionReportPage.downloadCsv(page);

    // Held since the start of the month and still fermenting: in use the whole month so far.
    const columns = (await page.getByRole('columnheader').allTextContents()).map((text) => text.trim());
    expect(row[columns.indexOf(`${code} in use`)]).toBe('100.0 %');
    expect(await page.getByRole('img', { name: 'Litres brewed per month' }).count()).toBe(1);
    const [header, ...months] = parse(csv.text) as string[][];
    const to = monthStart.toFormat('yyyy-MM');
    expect(csv.name).toBe(`production-${monthStart.minus({ months: 11 }).toFormat('yyyy-MM')}-to-${to}.csv`);
    expect(header.slice(0, 4)).toEqual(['Month', 'Complete', 'Litres brewed', 'Batches brewed']);
    expect(months).toHaveLength(12);
    const current = months[months.length - 1];
    expect(current[0]).toBe(to);
    expect(Number(current[2])).toBeGreaterThanOrEqual(21);
    expect(current[header.indexOf(`${code} in use %`)]).toBe('100.0');
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 120_000);

  it('when an admin reads the report on a 375 px phone, then each month is a card of labelled figures with no stray header row and no sideways scroll', async () => {
    const admin = await createUser(env.server.db, ['member', 'admin']);
    const { context, page } = await newPage(env.browser, env.server.baseUrl, { width: 375, height: 800 });
    await signInPage.signIn(page, admin.email, admin.password);
    await page.waitForURL(/\/today/);

    await productionReportPage.openFromBrewPlan(page);
    const thisMonth = `${DateTime.now().setZone(loadConfig().coopTimeZone).setLocale('en-US').toFormat('LLL yyyy')} (so far)`;
    const card = page.getByRole('row').filter({ has: page.getByRole('rowheader', { name: thisMonth, exact: true }) });
    expect(await card.locator('td[data-label="Litres brewed"]').isVisible()).toBe(true);
    // The column headers say only what each card's labels say: screen readers keep them, the eye does not.
    const headerRow = page.getByRole('row').filter({ has: page.getByRole('columnheader', { name: 'Litres brewed' }) });
    expect((await headerRow.boundingBox())?.height ?? 0).toBeLessThanOrEqual(1);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 90_000);
});
