import { randomUUID } from 'node:crypto';
import { densityTableCsv } from '../integration/helpers/density-table-factory';
import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { signInPage } from './helpers/pages';
import { dismissSnackBar } from './helpers/recipes-pages';
import { referenceTablesPage, strengthCheckPage } from './helpers/strength-pages';

describe('Strength check and reference tables in the browser', () => {
  const env = useE2eEnvironment();

  it('when a member converts a strength and plans a mix, then every form of it and the contraction are shown', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await strengthCheckPage.open(page);

    // OIML R 22 at 20 °C (from memory): 40 % vol ≙ 33.30 % mass, 948.05 kg/m³.
    await strengthCheckPage.convert(page, '% vol at 20 °C', '40', '20');
    expect(await strengthCheckPage.figure(page, 'conv-massPercent')).toBe('33.30 % mass');
    expect(await strengthCheckPage.figure(page, 'conv-density')).toBe('948.05 kg/m³');
    await strengthCheckPage.convert(page, '% mass', '33.3', '25');
    expect(await strengthCheckPage.figure(page, 'conv-percentVolume20')).toBe('40.00 % vol');
    expect(await page.getByText('Distillation:').count()).toBe(1);
    expect(await page.getByText('Declared strength:').count()).toBe(1);

    // Common practice: 40 mL of ethanol and 60 mL of water make about 96.7 mL.
    expect(await strengthCheckPage.figure(page, 'blend-final')).toBe('96.7 mL');
    expect(await strengthCheckPage.figure(page, 'blend-contraction')).toBe('3.3 mL');
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 90_000);

  it('when a brewer uploads a table with a mistyped row, then the row is marked with its bump and suggestion, and a correction clears it', async () => {
    const brewer = await createUser(env.server.db, ['member', 'brewer']);
    const name = `Printed table ${randomUUID().slice(0, 8)}`;
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, brewer.email, brewer.password);
    await page.waitForURL(/\/today/);
    await referenceTablesPage.open(page);

    const lines = densityTableCsv(20, 0.9).split('\n');
    lines[3] = '10,lots,20';
    await referenceTablesPage.upload(page, name, lines.join('\n'));
    expect(await referenceTablesPage.problems(page)).toEqual([expect.stringMatching(/^line 4: density "lots"/)]);

    await referenceTablesPage.upload(page, name, densityTableCsv(20, 0.9));
    await page.getByRole('heading', { level: 1, name }).waitFor();
    expect(await referenceTablesPage.auditSummary(page)).toBe('1 suspect row(s) stand out from the fitted curve.');
    const suspect = page.getByTestId('suspect-row');
    expect(await suspect.locator('td').first().textContent()).toBe('45');
    expect(await suspect.textContent()).toMatch(/Suspect: bump -?\d\.\d{4} cm³\/mol; suggested \d{3}\.\d{2} kg\/m³/);
    expect(await page.locator('canvas[baseChart]').count()).toBe(1);
    expect(await seriousA11yViolations(page)).toEqual([]);

    await suspect.getByRole('button', { name: /^Correct/ }).click();
    await page.getByLabel('Why (e.g. the printed source)').fill('misprint');
    await page.getByRole('button', { name: 'Save correction and re-run the audit' }).click();
    await page.getByText('No suspect rows: every row lies on the fitted curve.').waitFor();
    await dismissSnackBar(page);
    expect(await page.getByText(/by Test member brewer: misprint/).count()).toBe(1);
    await context.close();
  }, 90_000);
});
