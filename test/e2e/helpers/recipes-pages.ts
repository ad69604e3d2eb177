import { Locator, Page } from 'playwright-core';

/** Picks an option of a Material select by the option's visible text; taps its field, as a finger would. */
async function choose(select: Locator, optionText: string): Promise<void> {
  await select.locator('xpath=ancestor::mat-form-field').click();
  await select.page().getByRole('option', { name: optionText }).click();
}

/** Closes a snack bar if one is showing; its colours are the theme's, outside the Recipes area. */
export async function dismissSnackBar(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Dismiss' }).click({ timeout: 1000 }).catch(() => undefined);
  await page.locator('mat-snack-bar-container').waitFor({ state: 'detached' });
}

/** The recipe editor: the form, the prediction panel and the recipe's actions. */
export const recipeEditorPage = {
  async openNew(page: Page): Promise<void> {
    await page.goto('/recipes');
    await page.getByRole('heading', { level: 1, name: 'Recipes' }).waitFor();
    await page.getByRole('link', { name: 'New recipe' }).click();
    await page.getByRole('heading', { level: 1, name: 'New recipe' }).waitFor();
  },

  async name(page: Page, name: string): Promise<void> {
    await page.getByLabel('Recipe name').fill(name);
  },

  async addFermentable(page: Page, entryName: string, amount: string): Promise<void> {
    await page.getByRole('button', { name: 'Add fermentable' }).click();
    const row = page.getByRole('group', { name: /^Fermentable \d+$/ }).last();
    await choose(row.getByRole('combobox', { name: 'Fermentable' }), entryName);
    await row.getByLabel('Amount').fill(amount);
  },

  async addHop(page: Page, entryName: string, grams: string, minutes: string): Promise<void> {
    await page.getByRole('button', { name: 'Add hop' }).click();
    const row = page.getByRole('group', { name: /^Hop addition \d+$/ }).last();
    await choose(row.getByRole('combobox', { name: 'Hop' }), entryName);
    await row.getByLabel('Amount').fill(grams);
    await row.getByLabel('Time').fill(minutes);
  },

  async chooseYeast(page: Page, entryName: string): Promise<void> {
    await choose(page.getByRole('combobox', { name: 'Yeast' }), entryName);
  },

  /** A predicted figure as shown in the panel. */
  async shown(page: Page, figure: 'og' | 'fg' | 'ibu' | 'abv-density' | 'colour'): Promise<string> {
    return ((await page.getByTestId(`prediction-${figure}`).textContent()) ?? '').trim();
  },

  /** Waits until a predicted figure shows something other than `text`. */
  async waitForChange(page: Page, figure: 'og' | 'ibu', text: string): Promise<void> {
    await page.getByTestId(`prediction-${figure}`).filter({ hasNotText: new RegExp(`^\\s*${text.replace('.', '\\.')}\\s*$`) }).waitFor();
  },

  /** Waits until the form shows the batch volume given. */
  async waitForBatchVolume(page: Page, volume: string): Promise<void> {
    await page.waitForFunction((expected) => document.querySelector<HTMLInputElement>('input[formcontrolname="batchVolume"]')?.value === expected, volume);
  },

  /** Saves and waits for the saved version's number in the page. */
  async save(page: Page, expectedVersion: number): Promise<void> {
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await page.getByText(`Version ${expectedVersion} ·`).waitFor();
  },

  async scale(page: Page, volume: string): Promise<void> {
    await page.getByRole('button', { name: 'Scale…' }).click();
    await page.getByLabel('New batch volume').fill(volume);
    await page.getByRole('button', { name: 'Apply scaling' }).click();
  },
};

/** The versions page: pick two versions and compare them side by side. */
export const recipeVersionsPage = {
  async open(page: Page): Promise<void> {
    await page.getByRole('link', { name: 'Versions' }).click();
    await page.getByRole('heading', { level: 1, name: /^Versions of / }).waitFor();
  },

  async compare(page: Page): Promise<Locator> {
    await page.getByRole('button', { name: 'Compare' }).click();
    const table = page.getByRole('region', { name: 'Version comparison' });
    await table.waitFor();
    return table;
  },
};

/** The ingredient catalogue: tabs per kind, entry form, CSV import with its preview. */
export const cataloguePage = {
  async open(page: Page, tab: 'Fermentables' | 'Hops' | 'Yeasts' | 'Other additions'): Promise<void> {
    await page.goto('/recipes/catalogue');
    await page.getByRole('heading', { level: 1, name: 'Ingredient catalogue' }).waitFor();
    await page.getByRole('tab', { name: tab }).click();
  },

  async chooseCsv(page: Page, label: string, csv: string): Promise<void> {
    await page.getByLabel(label).setInputFiles({ name: 'catalogue.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.getByRole('heading', { name: /^Import preview/ }).waitFor();
  },

  async problems(page: Page): Promise<string[]> {
    return (await page.getByTestId('import-problems').locator('li').allTextContents()).map((text) => text.trim());
  },
};
