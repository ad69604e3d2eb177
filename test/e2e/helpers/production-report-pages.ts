import { readFile } from 'node:fs/promises';
import { Page } from 'playwright-core';

/** The production report page (admins), by what a person sees. */
export const productionReportPage = {
  /** From the Brew plan, as an admin finds it. */
  async openFromBrewPlan(page: Page): Promise<void> {
    await page.goto('/brew-plan');
    await page.getByRole('link', { name: 'Production report' }).click();
    await page.waitForURL(/\/brew-plan\/report$/);
    await page.getByRole('heading', { level: 1, name: 'Production report' }).waitFor();
    await page.getByRole('region', { name: 'Production by month' }).waitFor();
  },

  /** The row of one month in the table ("Dec 2026 (so far)"), cell texts in order. */
  async monthRow(page: Page, label: string): Promise<string[]> {
    const row = page.getByRole('row').filter({ has: page.getByRole('rowheader', { name: label, exact: true }) });
    return (await row.locator('th, td').allTextContents()).map((text) => text.trim());
  },

  /** Clicks Export CSV and returns the file's name and text. */
  async downloadCsv(page: Page): Promise<{ name: string; text: string }> {
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Export CSV' }).click()]);
    return { name: download.suggestedFilename(), text: await readFile(await download.path(), 'utf8') };
  },
};
