import { Page } from 'playwright-core';

/** The kit room page: its booking form and its calendar, by accessible names. */
export const kitRoomPage = {
  async open(page: Page): Promise<void> {
    await page.goto('/kit-room');
    await page.getByRole('heading', { level: 1, name: 'Kit room' }).waitFor();
  },

  /** Books `itemCode` from start to end, each given as yyyy-MM-dd and HH:mm. */
  async book(page: Page, itemCode: string, start: { date: string; time: string }, end: { date: string; time: string }): Promise<void> {
    const form = page.getByRole('form', { name: 'Book kit' });
    await form.getByRole('combobox', { name: 'Item' }).click();
    await page.getByRole('option', { name: new RegExp(`^${itemCode} ·`) }).click();
    await form.getByLabel('Start date').fill(start.date);
    await form.getByLabel('Start time').fill(start.time);
    await form.getByLabel('End date').fill(end.date);
    await form.getByLabel('End time').fill(end.time);
    await form.getByRole('button', { name: 'Book' }).click();
  },

  async showLaterPeriod(page: Page): Promise<void> {
    await page.getByRole('button', { name: 'Later' }).click();
  },

  /** The labels of the holds shown on one day of the calendar. */
  async holdsOn(page: Page, day: string): Promise<string[]> {
    const cell = page.locator(`[data-day="${day}"]`);
    await cell.waitFor();
    return (await cell.locator('.hold').allTextContents()).map((text) => text.trim());
  },

  /** Opens a hold of the calendar (admins): the panel to move or cancel its booking. */
  async openHold(page: Page, day: string, label: string): Promise<void> {
    await page.locator(`[data-day="${day}"]`).getByRole('button', { name: label }).click();
    await page.getByRole('form', { name: 'Move booking' }).waitFor();
  },

  /** Moves the opened booking: the start day typed, the end day picked in the date picker's calendar. */
  async moveOpened(page: Page, start: { date: string; time: string }, end: { pickDayLabel: string; time: string }): Promise<void> {
    const form = page.getByRole('form', { name: 'Move booking' });
    await form.getByLabel('Start date').fill(start.date);
    await form.getByLabel('Start time').fill(start.time);
    await form.getByRole('button', { name: 'Open calendar' }).nth(1).click();
    await page.getByRole('dialog').getByRole('button', { name: end.pickDayLabel }).click();
    await form.getByLabel('End time').fill(end.time);
    await form.getByRole('button', { name: 'Move booking' }).click();
  },

  myBookings(page: Page) {
    return page.getByRole('list', { name: 'My bookings' });
  },
};
