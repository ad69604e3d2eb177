import { Page } from 'playwright-core';
import { dismissSnackBar } from './recipes-pages';

/** Page objects of Batches and the Gravity log: what a person sees and does, by accessible names. */
export const batchStartPage = {
  async open(page: Page): Promise<void> {
    await page.goto('/batches/new');
    await page.getByRole('heading', { level: 1, name: 'Start a batch' }).waitFor();
  },

  async choose(page: Page, label: string, option: string | RegExp): Promise<void> {
    await page.getByRole('combobox', { name: label }).click();
    await page.getByRole('option', { name: option }).click();
  },
};

export const gravityLogPage = {
  /** Logs a reading at the form's default time (now, co-op time) and waits until it is saved. */
  async log(page: Page, reading: { instrument: string; value: string; unit?: string }): Promise<void> {
    const form = page.getByRole('form', { name: 'Log a reading' });
    const before = await gravityLogPage.rowCount(page);
    await form.getByRole('combobox', { name: 'Instrument' }).click();
    await page.getByRole('option', { name: reading.instrument, exact: true }).click();
    if (reading.unit) {
      await form.getByRole('combobox', { name: 'Unit' }).click();
      await page.getByRole('option', { name: reading.unit, exact: true }).click();
    }
    await form.getByLabel('Reading').fill(reading.value);
    const saved = page.waitForResponse((res) => /\/api\/batches\/\d+\/readings$/.test(res.url()) && res.request().method() === 'POST');
    await form.getByRole('button', { name: 'Log reading' }).click();
    const res = await saved;
    if (res.status() !== 201) throw new Error(`logging the reading answered ${res.status()}: ${await res.text()}`);
    await page.locator('mat-snack-bar-container').getByText('Reading saved: SG').waitFor();
    await dismissSnackBar(page);
    await page.waitForFunction((n) => document.querySelectorAll('cw-readings-table tr.mat-mdc-row:not(:has(td.empty))').length === n, before + 1);
  },

  async rowCount(page: Page): Promise<number> {
    return page.getByRole('region', { name: 'Readings' }).locator('tr.mat-mdc-row:not(:has(td.empty))').count();
  },
};
