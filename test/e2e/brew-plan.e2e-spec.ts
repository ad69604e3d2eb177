import { randomUUID } from 'node:crypto';
import { DateTime } from 'luxon';
import { loadConfig } from '@server/config';
import { ApiClient } from '../integration/helpers/api-client';
import { createAleRecipe, createSizedFermenter } from '../integration/helpers/brew-plan-factory';
import { givePaidUpDues } from '../integration/helpers/dues-factory';
import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { brewPlanPage } from './helpers/brew-plan-pages';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { kitRoomPage } from './helpers/kit-room-pages';
import { signInPage } from './helpers/pages';
import { dismissSnackBar } from './helpers/recipes-pages';

describe('Brew plan in the browser', () => {
  const env = useE2eEnvironment();

  it('when a brewer plans a batch and accepts the proposed slot, then it shows on the timeline and in the kit room calendar', async () => {
    const db = env.server.db;
    const brewer = await createUser(db, ['member', 'brewer'], { name: 'Ines Planwell' });
    await givePaidUpDues(db, brewer.id);
    // Only this fermenter holds 1900 L, so the earliest proposal is on it.
    const fermenter = await createSizedFermenter(db, 1900);
    const recipe = await createAleRecipe(db, await ApiClient.signedIn(env.server.baseUrl, brewer));
    const recipeName = (await db('recipes').where({ id: recipe.id }).first())!.name;
    const zone = loadConfig().coopTimeZone;
    const nextMonday = DateTime.now().setZone(zone).startOf('week').plus({ weeks: 1 }).toISODate()!;
    const batchName = `Hedgerow pale ${randomUUID().slice(0, 4)}`;
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, brewer.email, brewer.password);
    await page.waitForURL(/\/today/);

    await brewPlanPage.open(page);
    await brewPlanPage.askForSlots(page, { name: batchName, recipe: recipeName, volumeLitres: 1900, wantedWeek: nextMonday });
    const day = (date: string) => DateTime.fromISO(date).toFormat('d LLL yyyy', { locale: 'en-GB' });
    const accept = brewPlanPage.proposals(page).getByRole('button', { name: `Accept ${fermenter.code} from ${day(nextMonday)}` });
    await accept.click();
    await page.getByText(`Planned on ${fermenter.code}`).waitFor();

    const lane = brewPlanPage.lane(page, fermenter.code);
    await lane.getByRole('article', { name: `${batchName}, Planned` }).waitFor();
    // A batch's timeline dates are days, without hours, in the style of every other date.
    const entry = lane.getByRole('article', { name: `${batchName}, Planned` });
    const when = (await entry.locator('.when').textContent())!;
    expect(when).toMatch(new RegExp(`^${day(nextMonday)} – \\d{1,2} \\w{3} \\d{4}`));
    expect(when).not.toMatch(/\d\d:\d\d/);
    await dismissSnackBar(page);
    expect(await seriousA11yViolations(page)).toEqual([]);

    await kitRoomPage.open(page);
    await kitRoomPage.showLaterPeriod(page);
    expect(await kitRoomPage.holdsOn(page, nextMonday)).toContain(`${fermenter.code} · Ines Planwell · from 08:00`);
    await context.close();
  }, 120_000);

  it('when a brewer moves a planned batch onto a maintenance block, then the plan names the block; a free date moves it', async () => {
    const db = env.server.db;
    const brewer = await createUser(db, ['member', 'brewer'], { name: 'Ola Moveright' });
    await givePaidUpDues(db, brewer.id);
    const admin = await ApiClient.signedIn(env.server.baseUrl, await createUser(db, ['member', 'admin']));
    const fermenter = await createSizedFermenter(db, 1800);
    const api = await ApiClient.signedIn(env.server.baseUrl, brewer);
    const recipe = await createAleRecipe(db, api);
    const zone = loadConfig().coopTimeZone;
    const week = (n: number) => DateTime.now().setZone(zone).startOf('week').plus({ weeks: n });
    const batchName = `Moving mild ${randomUUID().slice(0, 4)}`;
    const planned = await api.send('post', '/api/brew-plan/batches', { name: batchName, recipeId: recipe.id, recipeVersion: recipe.version, volumeLitres: 1800, kitItemId: fermenter.id, brewDate: week(1).toISODate(), fermentationDays: 14, conditioningDays: 7 });
    expect(planned.status).toBe(201);
    // The batch holds the fermenter from week 1 to week 4; the block is in week 5.
    const blockDay = week(5).plus({ days: 2 }).toISODate();
    const block = await admin.send('post', '/api/bookings', { kitItemId: fermenter.id, start: `${blockDay}T09:00`, end: `${blockDay}T17:00`, purpose: 'maintenance', note: 'Seal change' });
    expect(block.status).toBe(201);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, brewer.email, brewer.password);
    await page.waitForURL(/\/today/);

    await brewPlanPage.open(page);
    await brewPlanPage.moveBatch(page, batchName, week(4).toISODate()!);
    const refusal = brewPlanPage.lane(page, fermenter.code).getByRole('alert');
    await refusal.waitFor();
    expect(await refusal.textContent()).toContain(`blocked for maintenance (booking #${block.body.id})`);

    await brewPlanPage.moveBatch(page, batchName, week(6).toISODate()!);
    const newDay = week(6).toFormat('d LLL yyyy', { locale: 'en-GB' });
    await page.getByText(`Planned on ${fermenter.code}: brew day ${newDay}`).waitFor();
    await brewPlanPage.lane(page, fermenter.code).getByText(new RegExp(`^${newDay} – `)).waitFor();
    expect(await brewPlanPage.lane(page, fermenter.code).getByRole('alert').count()).toBe(0);
    await context.close();
  }, 120_000);

  it('when a member opens the plan on a 375 px screen, then every fermenter is listed without sideways scrolling and nothing can be planned', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { context, page } = await newPage(env.browser, env.server.baseUrl, { width: 375, height: 800 });
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);

    await brewPlanPage.open(page);
    await page.locator('cw-fermenter-lane').first().waitFor();

    expect(await page.getByRole('form', { name: 'Plan a batch' }).count()).toBe(0);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 90_000);
});
