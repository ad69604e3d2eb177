import { createRecipesService } from '@server/recipes';
import { createFermenter } from '../integration/helpers/batch-factory';
import { createCatalogueEntries, sampleDesign } from '../integration/helpers/catalogue-factory';
import { createUser } from '../integration/helpers/user-factory';
import { batchStartPage, gravityLogPage } from './helpers/batches-pages';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { signInPage } from './helpers/pages';
import { dismissSnackBar } from './helpers/recipes-pages';

// Two good rows and one bad (line 3: the value is not a number).
const CSV = 'time,instrument,value,unit,temperature_c\n2026-11-21 08:00,logger,1.044,sg,19\n2026-11-21 12:00,logger,n/a,sg,19\n2026-11-21 16:00,logger,1.040,sg,19\n';

describe('Batches and the gravity log in the browser', () => {
  const env = useE2eEnvironment();

  it('when a member starts a batch from a recipe, logs three readings and uploads a CSV with one bad row, then the line error shows and the good rows are imported', async () => {
    const member = await createUser(env.server.db, ['member'], { name: 'Bea Batch' });
    const ids = await createCatalogueEntries(env.server.db);
    const owner = { id: member.id, email: member.email, name: 'Bea Batch', roles: member.roles };
    await createRecipesService(env.server.db).create(owner, sampleDesign(ids, `Batch pale ${ids.tag}`), 'private');
    const fermenterId = await createFermenter(env.server.db);
    const fermenter = await env.server.db('kit_items').where({ id: fermenterId }).first();
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);

    await batchStartPage.open(page);
    await batchStartPage.choose(page, 'Recipe', `Batch pale ${ids.tag}`);
    await page.getByRole('combobox', { name: 'Version' }).getByText('Version 1').waitFor();
    await batchStartPage.choose(page, 'Fermenter', new RegExp(`^${fermenter!.code} `));
    expect(await page.getByLabel('Batch name').inputValue()).toBe(`Batch pale ${ids.tag}`);
    await page.getByRole('button', { name: 'Start the batch' }).click();
    await page.waitForURL(/\/batches\/\d+$/);
    await page.getByRole('heading', { level: 1, name: `Batch pale ${ids.tag}` }).waitFor();
    expect(await page.getByText(/^Predicted FG 1\.0\d\d$/).count()).toBe(1);
    await dismissSnackBar(page);
    expect(await seriousA11yViolations(page)).toEqual([]);

    await page.getByRole('link', { name: 'Gravity log' }).last().click();
    await page.getByRole('heading', { level: 1, name: `Gravity log · Batch pale ${ids.tag}` }).waitFor();
    await gravityLogPage.log(page, { instrument: 'Hydrometer', value: '1.052' });
    await gravityLogPage.log(page, { instrument: 'Refractometer', value: '13.1' });
    await gravityLogPage.log(page, { instrument: 'Digital density meter', value: '1050.1', unit: 'kg/m³' });
    expect(await gravityLogPage.rowCount(page)).toBe(3);
    expect(await seriousA11yViolations(page)).toEqual([]);

    await page.getByRole('button', { name: 'Upload readings from a file' }).click();
    await page.getByLabel('Readings file').setInputFiles({ name: 'logger.csv', mimeType: 'text/csv', buffer: Buffer.from(CSV) });
    await page.getByRole('region', { name: 'First rows of the file' }).waitFor();
    await page.getByRole('button', { name: 'Check the file' }).click();
    await page.getByText('Line 3: value: "n/a" is not a number').waitFor();
    await page.getByText(/^Checked 3 rows: 2 good, 1 bad/).waitFor();
    await page.getByRole('button', { name: 'Import', exact: true }).click();
    await page.getByText(/^Imported 2 of 3 rows/).waitFor();
    await page.getByText('Line 3: value: "n/a" is not a number').waitFor();
    const batchId = Number(new URL(page.url()).pathname.split('/').pop());
    const stored = await env.server.db('gravity_readings').where({ batch_id: batchId }).orderBy('measured_at');
    expect(stored.map((r) => r.source).sort()).toEqual(['file', 'file', 'hand', 'hand', 'hand']);
    await page.locator('cw-readings-table').getByText('logger.csv').first().waitFor();
    expect(await gravityLogPage.rowCount(page)).toBe(5);

    await page.locator('.batch-links').getByRole('link', { name: 'Chart and forecast' }).click();
    await page.getByRole('heading', { level: 1, name: `Fermentation: Batch pale ${ids.tag}` }).waitFor();
    await page.goBack();
    await page.locator('.batch-links').getByRole('link', { name: 'Strength check' }).click();
    await page.getByRole('heading', { level: 1, name: `Strength check: Batch pale ${ids.tag}` }).waitFor();
    await context.close();
  }, 120_000);

  it('when a member uses a 375 px wide phone, then a reading can be logged and the figures fit the screen', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { context, page } = await newPage(env.browser, env.server.baseUrl, { width: 375, height: 740 });
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    const created = await page.evaluate(async () => {
      const token = decodeURIComponent(document.cookie.match(/XSRF-TOKEN=([^;]+)/)![1]);
      const res = await fetch('/api/batches', {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', 'X-XSRF-TOKEN': token },
        body: JSON.stringify({ name: 'Phone batch', recipeId: null, recipeVersion: null, brewDate: '2026-11-20', plannedVolumeLitres: 20, fermenterId: null }),
      });
      return res.json();
    });
    await page.goto(`/gravity-log/${created.id}`);
    await page.getByRole('heading', { level: 1, name: 'Gravity log · Phone batch' }).waitFor();
    const value = page.getByRole('form', { name: 'Log a reading' }).getByLabel('Reading');
    const box = await value.boundingBox();
    expect(box!.x + box!.width).toBeLessThanOrEqual(375);
    await gravityLogPage.log(page, { instrument: 'Hydrometer', value: '1.048' });
    expect(await gravityLogPage.rowCount(page)).toBe(1);
    await page.getByText('1.0480').first().waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    // The reading is a card: its corrected SG sits inside the screen, with no sideways scroll in the table either.
    const corrected = page.getByRole('region', { name: 'Readings' }).locator('td[data-label="SG 20/20 °C"]').first();
    await corrected.scrollIntoViewIfNeeded();
    expect(await corrected.isVisible()).toBe(true);
    expect(await corrected.textContent()).toContain('1.0480');
    const sgBox = await corrected.boundingBox();
    expect(sgBox!.x).toBeGreaterThanOrEqual(0);
    expect(sgBox!.x + sgBox!.width).toBeLessThanOrEqual(375);
    expect(sgBox!.y).toBeGreaterThanOrEqual(0);
    expect(sgBox!.y + sgBox!.height).toBeLessThanOrEqual(740);
    expect(await page.getByRole('region', { name: 'Readings' }).evaluate((el) => el.scrollWidth - el.clientWidth)).toBeLessThanOrEqual(0);
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 90_000);
});
