import { Page } from 'playwright-core';

/** The Strength check area: converter and blending planner. */
export const strengthCheckPage = {
  async open(page: Page): Promise<void> {
    await page.goto('/strength-check');
    await page.getByRole('heading', { level: 1, name: 'Strength check' }).waitFor();
  },

  async convert(page: Page, quantity: string, value: string, temperature: string): Promise<void> {
    await page.getByRole('combobox', { name: 'I know the' }).click();
    await page.getByRole('option', { name: quantity, exact: true }).click();
    await page.getByLabel('Value', { exact: true }).fill(value);
    await page.getByLabel('Temperature t of the sample').fill(temperature);
  },

  async figure(page: Page, testId: string): Promise<string> {
    return ((await page.getByTestId(testId).textContent()) ?? '').trim();
  },
};

/** The Reference tables area: upload, audit and correction. */
export const referenceTablesPage = {
  /** Opens the page once its list of uploaded tables is drawn, so the form below stops moving. */
  async open(page: Page): Promise<void> {
    await page.goto('/reference-tables');
    await page.getByRole('heading', { level: 1, name: 'Reference tables' }).waitFor();
    await page.locator('section[aria-labelledby="cw-tables-title"][aria-busy="false"]').waitFor();
  },

  async upload(page: Page, name: string, csv: string, fileName = 'table.csv'): Promise<void> {
    await page.getByLabel('Table name').fill(name);
    await page.getByLabel('CSV file of the density table').setInputFiles({ name: fileName, mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.getByRole('button', { name: 'Upload and audit' }).click();
  },

  async problems(page: Page): Promise<string[]> {
    await page.getByTestId('upload-problems').waitFor();
    return (await page.getByTestId('upload-problems').locator('li').allTextContents()).map((text) => text.trim());
  },

  async auditSummary(page: Page): Promise<string> {
    return ((await page.getByTestId('audit-summary').textContent()) ?? '').trim();
  },
};
