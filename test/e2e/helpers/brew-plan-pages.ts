import { Page } from 'playwright-core';

/** The brew plan page: its timeline lanes and the plan form, by accessible names. */
export const brewPlanPage = {
  async open(page: Page): Promise<void> {
    await page.goto('/brew-plan');
    await page.getByRole('heading', { level: 1, name: 'Brew plan' }).waitFor();
  },

  /** Fills the plan form and asks for proposals. */
  async askForSlots(page: Page, plan: { name: string; recipe: string; volumeLitres: number; wantedWeek: string }): Promise<void> {
    const form = page.getByRole('form', { name: 'Plan a batch' });
    await form.getByLabel('Batch name').fill(plan.name);
    await form.getByRole('combobox', { name: 'Recipe' }).click();
    await page.getByRole('option', { name: plan.recipe }).click();
    await form.getByLabel('Volume (L)').fill(String(plan.volumeLitres));
    await form.getByLabel('Wanted week').fill(plan.wantedWeek);
    await form.getByRole('button', { name: 'Propose slots' }).click();
  },

  proposals(page: Page) {
    return page.getByRole('list', { name: 'Proposed slots' });
  },

  /** Moves a planned batch to another brew date with the form in its lane entry. */
  async moveBatch(page: Page, batchName: string, brewDate: string): Promise<void> {
    const form = page.getByRole('form', { name: `Move ${batchName}` });
    await form.getByLabel('New brew date').fill(brewDate);
    await form.getByRole('button', { name: 'Move' }).click();
  },

  /** The lane of one fermenter, found by its heading. */
  lane(page: Page, code: string) {
    return page.locator('cw-fermenter-lane').filter({ has: page.getByRole('heading', { level: 3, name: new RegExp(`^${code} `) }) });
  },
};
