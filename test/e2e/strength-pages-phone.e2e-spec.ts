import { Page } from 'playwright-core';
import { randomUUID } from 'node:crypto';
import { densityTableCsv } from '../integration/helpers/density-table-factory';
import { createUser } from '../integration/helpers/user-factory';
import { seedFermentedBatch } from './helpers/batch-strength-seed';
import { newPage } from './helpers/browser';
import { settled } from './helpers/phone';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { signInPage } from './helpers/pages';
import { referenceTablesPage, strengthCheckPage } from './helpers/strength-pages';

const PHONE = { width: 375, height: 740 };

/** Nothing scrolls sideways: the page is no wider than the phone. */
const pageWidth = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth);

/** The element lies inside the phone's screen, left to right and top to bottom. */
async function onScreen(page: Page, testIdOrLabel: ReturnType<Page['getByTestId']>): Promise<boolean> {
  await settled(page);
  const box = await testIdOrLabel.boundingBox();
  return !!box && box.x >= 0 && box.x + box.width <= PHONE.width && box.y >= 0 && box.y + box.height <= PHONE.height;
}

describe('Strength pages on a 375 px phone', () => {
  const env = useE2eEnvironment();

  it('when a member converts a strength on a phone, then the field being typed in and its result are in sight and nothing scrolls sideways', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { context, page } = await newPage(env.browser, env.server.baseUrl, PHONE);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await strengthCheckPage.open(page);

    // OIML R 22 at 20 °C (from memory): 40 % vol ≙ 33.30 % mass.
    await strengthCheckPage.convert(page, '% vol at 20 °C', '40', '20');
    const value = page.getByLabel('Value', { exact: true });
    expect(await onScreen(page, value)).toBe(true);
    expect(await strengthCheckPage.figure(page, 'conv-massPercent')).toBe('33.30 % mass');
    await page.getByTestId('conv-massPercent').scrollIntoViewIfNeeded();
    expect(await onScreen(page, page.getByTestId('conv-massPercent'))).toBe(true);
    expect(await pageWidth(page)).toBeLessThanOrEqual(PHONE.width);
    await context.close();
  }, 120_000);

  it("when a brewer checks a batch's strength and uploads a density table on a phone, then the fields are in sight and nothing scrolls sideways", async () => {
    const brewer = await createUser(env.server.db, ['member', 'brewer']);
    const { batchId } = await seedFermentedBatch(env.server.db, brewer.id);
    const { context, page } = await newPage(env.browser, env.server.baseUrl, PHONE);
    await signInPage.signIn(page, brewer.email, brewer.password);
    await page.waitForURL(/\/today/);

    await page.goto(`/strength-check/batches/${batchId}`);
    await page.getByTestId('density-based').waitFor();
    const declared = page.getByRole('spinbutton', { name: 'Declared strength' });
    await declared.evaluate((field) => field.scrollIntoView({ block: 'center' }));
    await declared.fill('4.9');
    expect(await onScreen(page, declared)).toBe(true);
    expect(await pageWidth(page)).toBeLessThanOrEqual(PHONE.width);

    await referenceTablesPage.open(page);
    const name = page.getByLabel('Table name');
    // Brought to the middle of the screen as a person scrolls to it, not to the very edge, so a
    // pixel of late layout above it can't push it out.
    await name.evaluate((field) => field.scrollIntoView({ block: 'center' }));
    await name.fill(`Phone table ${randomUUID().slice(0, 8)}`);
    expect(await onScreen(page, name)).toBe(true);
    await page.getByLabel('CSV file of the density table').setInputFiles({ name: 'table.csv', mimeType: 'text/csv', buffer: Buffer.from(densityTableCsv(20, 0.9)) });
    await page.getByRole('button', { name: 'Upload and audit' }).click();
    await page.getByTestId('audit-summary').waitFor();
    expect(await pageWidth(page)).toBeLessThanOrEqual(PHONE.width);
    await context.close();
  }, 120_000);
});
