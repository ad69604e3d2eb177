import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { addReading, seedFermentedBatch } from './helpers/batch-strength-seed';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { shell, signInPage } from './helpers/pages';
import { dismissSnackBar } from './helpers/recipes-pages';

describe('A batch\'s fermentation chart and strength check in the browser', () => {
  const env = useE2eEnvironment();

  it('when a member opens a fermenting batch, then the chart shows its forecast and the check shows both figures without a sign-off button', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { batchId } = await seedFermentedBatch(env.server.db, member.id);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);

    await page.goto(`/fermentation/${batchId}`);
    await page.getByTestId('forecast-fg').waitFor();
    expect(await page.getByTestId('forecast-fg').textContent()).toMatch(/^1\.0\d\d \(1\.0\d\d–1\.0\d\d\)$/);
    expect(await page.locator('canvas[baseChart]').getAttribute('aria-label')).toBe('Gravity and temperature over time, 24 readings, with the forecast and its band');
    expect(await seriousA11yViolations(page)).toEqual([]);

    await page.getByRole('link', { name: 'Strength check of this batch' }).click();
    await page.getByTestId('density-based').waitFor();
    expect(await page.getByTestId('density-based').textContent()).toMatch(/% vol at 20 °C\s*\d\.\d\d ± 0\.\d\d/);
    expect(await page.getByTestId('linear-estimate').textContent()).toMatch(/131\.25\s*\d\.\d\d ± 0\.\d\d/);
    expect(await page.getByTestId('strength-steps').locator('tr').count()).toBe(7);
    expect(await page.getByRole('button', { name: 'Sign off the declared strength' }).count()).toBe(0);
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 90_000);

  it('when a brewer signs off a declared strength, then the record shows it, and a later reading marks it stale', async () => {
    const brewer = await createUser(env.server.db, ['member', 'brewer'], { name: 'Tamsin Test' });
    const seeded = await seedFermentedBatch(env.server.db, brewer.id);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, brewer.email, brewer.password);
    await page.waitForURL(/\/today/);
    await page.goto(`/strength-check/batches/${seeded.batchId}`);
    const density = (await page.getByTestId('density-based').locator('.value').textContent())!;
    const declared = (Math.round(Number(density.split('±')[0]) * 10) / 10).toFixed(1);

    await page.getByRole('spinbutton', { name: 'Declared strength' }).fill(declared);
    await page.getByRole('combobox', { name: 'Product class' }).click({ force: true });
    await page.getByRole('option', { name: new RegExp(seeded.toleranceClassName) }).click();
    await page.getByRole('button', { name: 'Check against the tolerance' }).click();
    await page.getByTestId('verdict').waitFor();
    expect(await page.getByTestId('verdict').textContent()).toMatch(/^\s*Within the tolerance/);
    await page.getByRole('button', { name: 'Sign off the declared strength' }).click();

    await page.waitForURL(/\/records\/\d+$/);
    expect(await shell.heading(page)).toMatch(/^Strength record: Seeded ale/);
    expect(await page.getByTestId('record-declared').textContent()).toBe(`${Number(declared)} % vol`);
    expect(await page.getByTestId('record-signed-by').textContent()).toMatch(/^Tamsin Test, /);
    expect(await page.getByTestId('record-stale').count()).toBe(0);
    expect(await seriousA11yViolations(page)).toEqual([]);

    await addReading(env.server.db, seeded.batchId, seeded.lastReadingAt + 6 * 3_600_000, 1.009);
    await page.reload();
    await page.getByTestId('record-stale').waitFor();
    await dismissSnackBar(page);
    await context.close();
  }, 90_000);
});
