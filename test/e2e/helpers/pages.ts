import { expect } from '@jest/globals';
import { Page } from 'playwright-core';

/** Page objects: what a person sees and does, by accessible names. */
export const signInPage = {
  async signIn(page: Page, email: string, password: string): Promise<void> {
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
  },
};

export const shell = {
  async heading(page: Page): Promise<string> {
    const h1 = page.getByRole('heading', { level: 1 });
    await h1.waitFor();
    return (await h1.textContent())?.trim() ?? '';
  },
  async signOut(page: Page): Promise<void> {
    await page.getByRole('button', { name: 'Account menu' }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in/);
  },
};

export const membersPage = {
  async invite(page: Page, email: string): Promise<string> {
    await page.goto('/members');
    await page.getByRole('heading', { level: 1, name: 'Members' }).waitFor();
    const form = page.locator('cw-invite-form');
    await form.getByLabel('E-mail').fill(email);
    await form.getByRole('button', { name: 'Send invitation' }).click();
    const link = page.getByTestId('invitation-link');
    await link.waitFor();
    const text = (await link.textContent()) ?? (await link.inputValue());
    expect(text).toContain('/invitations/');
    return text.trim();
  },
};

export const acceptInvitationPage = {
  async accept(page: Page, link: string, name: string, password: string): Promise<void> {
    await page.goto(new URL(link).pathname);
    await page.getByLabel('Your name').fill(name);
    await page.getByLabel('Password', { exact: true }).fill(password);
    await page.getByLabel('Confirm password').fill(password);
    await page.getByRole('button', { name: 'Join the co-op' }).click();
  },
};
