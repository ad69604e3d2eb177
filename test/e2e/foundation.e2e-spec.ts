import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { acceptInvitationPage, membersPage, shell, signInPage } from './helpers/pages';

describe('Foundation in the browser', () => {
  const env = useE2eEnvironment();

  it('when a member signs in on the real page, then Today greets them and no page has a serious accessibility violation', async () => {
    const member = await createUser(env.server.db, ['member'], { name: 'Rowan Member' });
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await page.goto('/sign-in');
    expect(await seriousA11yViolations(page)).toEqual([]);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    expect(await shell.heading(page)).toContain('Today');
    await page.getByText('Rowan Member').first().waitFor();
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  });

  it('when a member opens the Members page, then they are refused and the member list is not shown', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await page.goto('/members');
    expect(await shell.heading(page)).toBe('Not allowed');
    expect(await page.getByRole('link', { name: 'Members' }).count()).toBe(0);
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  });

  it('when a wrong password is typed, then the page says so and stays on sign-in', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, 'definitely wrong');
    await page.getByText('do not match').waitFor();
    expect(page.url()).toContain('/sign-in');
    await context.close();
  });

  it('when an admin invites a person, then the person accepts, lands on Today, and can sign in again', async () => {
    const admin = await createUser(env.server.db, ['member', 'admin'], { name: 'Officer Test' });
    const email = `invitee-${Date.now()}@test.example`;
    const officer = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(officer.page, admin.email, admin.password);
    await officer.page.waitForURL(/\/today/);
    const link = await membersPage.invite(officer.page, email);
    expect(await seriousA11yViolations(officer.page)).toEqual([]);

    const guest = await newPage(env.browser, env.server.baseUrl);
    await acceptInvitationPage.accept(guest.page, link, 'Juniper Invitee', 'a long enough password');
    await guest.page.waitForURL(/\/today/);
    expect(await shell.heading(guest.page)).toContain('Today');
    await shell.signOut(guest.page);
    await signInPage.signIn(guest.page, email, 'a long enough password');
    await guest.page.waitForURL(/\/today/);
    await officer.context.close();
    await guest.context.close();
  });

  it('when a member uses a 375 px wide phone screen, then sign-in and Today work and the navigation opens', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { context, page } = await newPage(env.browser, env.server.baseUrl, { width: 375, height: 740 });
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    expect(await seriousA11yViolations(page)).toEqual([]);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await page.getByRole('button', { name: /navigation/i }).click();
    await page.getByRole('link', { name: 'Today' }).waitFor();
    await context.close();
  });

  it('when a member opens their profile from the account menu, then the new name shows at once and the password changes only with the current one', async () => {
    const member = await createUser(env.server.db, ['member'], { name: 'Profile Before' });
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await page.getByRole('button', { name: 'Account menu' }).click();
    await page.getByRole('menuitem', { name: 'Your profile' }).click();
    await page.getByRole('heading', { level: 1, name: 'Your profile' }).waitFor();

    await page.getByLabel('Your name').fill('Profile After');
    await page.getByRole('button', { name: 'Save your details' }).click();
    await page.getByText('Your profile is saved.').waitFor();
    await page.locator('cw-user-menu').getByText('Profile After').waitFor();

    await page.getByLabel('Current password').fill('not the password');
    await page.getByLabel('New password', { exact: true }).fill('a new long password');
    await page.getByLabel('Confirm password').fill('a new long password');
    await page.getByRole('button', { name: 'Change the password' }).click();
    await page.getByText(/^The current password /).waitFor();
    await page.getByLabel('Current password').fill(member.password);
    await page.getByRole('button', { name: 'Change the password' }).click();
    await page.getByText('Password changed; your other sessions are signed out.').waitFor();
    expect(await seriousA11yViolations(page)).toEqual([]);
    await shell.signOut(page);

    await signInPage.signIn(page, member.email, 'a new long password');
    await page.waitForURL(/\/today/);
    await context.close();
  }, 90_000);
});
