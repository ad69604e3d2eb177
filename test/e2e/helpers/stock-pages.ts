import { Page } from 'playwright-core';

/** Page objects of Stock and What to buy: what a person sees and does, by accessible names. */
export const stockPage = {
  async open(page: Page): Promise<void> {
    await page.goto('/stock');
    await page.getByRole('heading', { level: 1, name: 'Stock' }).waitFor();
  },

  /** Receives a lot through the dialog and waits for the saved lot. */
  async receive(page: Page, lot: { ingredient: string; quantity: string; bestBefore: string; note: string }): Promise<void> {
    await page.getByRole('button', { name: 'Receive a lot' }).click();
    const dialog = page.getByRole('dialog', { name: 'Receive a lot' });
    await dialog.getByRole('combobox', { name: 'Ingredient' }).click();
    await page.getByRole('option', { name: lot.ingredient }).click();
    await dialog.getByLabel('Quantity').fill(lot.quantity);
    await dialog.getByLabel('Best before').fill(lot.bestBefore);
    await dialog.getByLabel('Supplier note').fill(lot.note);
    const saved = page.waitForResponse((res) => res.url().endsWith('/api/stock/lots') && res.request().method() === 'POST');
    await dialog.getByRole('button', { name: 'Receive' }).click();
    const res = await saved;
    if (res.status() !== 201) throw new Error(`receiving the lot answered ${res.status()}: ${await res.text()}`);
  },
};

export const shoppingListPage = {
  async open(page: Page): Promise<void> {
    await page.goto('/stock/to-buy');
    await page.getByRole('heading', { level: 1, name: 'What to buy' }).waitFor();
  },

  /** The row of one ingredient in the list. */
  row(page: Page, ingredient: string) {
    return page.getByRole('region', { name: 'What to buy' }).getByRole('row').filter({ hasText: ingredient });
  },
};
