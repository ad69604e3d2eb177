import { Page } from 'playwright-core';

/** Page objects of the Dues area and the Outbox, by what a person sees. */
export const duesPage = {
  async open(page: Page): Promise<void> {
    await page.goto('/dues');
    await page.getByRole('heading', { level: 1, name: 'Dues' }).waitFor();
    await page.getByTestId('dues-standing').waitFor();
  },
  async pay(page: Page, planName: string, cardLabel: string): Promise<void> {
    await page.getByRole('radio', { name: new RegExp(`^${planName} ·`) }).check();
    await page.getByRole('radio', { name: new RegExp(cardLabel) }).check();
    await page.getByRole('button', { name: 'Pay dues' }).click();
  },
  paidThrough: (page: Page) => page.getByTestId('paid-through'),
};

export const duesLedgerPage = {
  async open(page: Page): Promise<void> {
    await page.goto('/dues/ledger');
    await page.getByRole('heading', { level: 1, name: 'Dues ledger' }).waitFor();
    await page.getByRole('heading', { level: 2, name: 'Members' }).waitFor();
  },
};

export const outboxPage = {
  async open(page: Page): Promise<void> {
    await page.goto('/outbox');
    await page.getByRole('heading', { level: 1, name: 'Outbox' }).waitFor();
  },
  async show(page: Page, subject: string, recipient: string): Promise<void> {
    await page.getByRole('button', { name: `Show the message ${subject} to ${recipient}` }).click();
    await page.getByTestId('mail-preview').waitFor();
  },
};
