import { DateTime } from 'luxon';
import { waitForMailTo } from '../integration/helpers/caught-mail';
import { createPlan } from '../integration/helpers/dues-factory';
import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { duesPage, outboxPage } from './helpers/dues-pages';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { acceptInvitationPage, membersPage, shell, signInPage } from './helpers/pages';

const today = () => DateTime.now().setZone(process.env.COOP_TIME_ZONE ?? 'Europe/Berlin');

describe('Dues and e-mail in the browser', () => {
  const env = useE2eEnvironment();

  it('when a member pays dues with a test card, then a declined card changes nothing, a good one moves the paid-through date, and an admin sees the receipt in the outbox', async () => {
    const plan = await createPlan(env.server.db);
    const member = await createUser(env.server.db, ['member'], { name: 'Wren Payer' });
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await duesPage.open(page);
    await page.getByText('Test mode:').waitFor();
    expect(await seriousA11yViolations(page)).toEqual([]);

    await duesPage.pay(page, plan.name, 'declined by the bank');
    await page.getByRole('alert').filter({ hasText: 'declined' }).waitFor();
    expect(await duesPage.paidThrough(page).count()).toBe(0);

    await duesPage.pay(page, plan.name, 'Test Visa ending 4242');
    const expected = today().plus({ months: 1 }).minus({ days: 1 }).toISODate()!;
    await duesPage.paidThrough(page).filter({ hasText: expected }).waitFor();
    await page.getByRole('row').filter({ hasText: plan.name }).filter({ hasText: '12.00 EUR' }).waitFor();
    await context.close();

    const admin = await createUser(env.server.db, ['member', 'admin']);
    const officer = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(officer.page, admin.email, admin.password);
    await officer.page.waitForURL(/\/today/);
    await outboxPage.open(officer.page);
    const subject = `Receipt: co-op dues paid through ${expected}`;
    await outboxPage.show(officer.page, subject, member.email);
    await officer.page.getByTestId('mail-preview').getByText('12.00 EUR').waitFor();
    expect(await seriousA11yViolations(officer.page)).toEqual([]);
    await officer.context.close();
  });

  it('when a member is on a 375 px phone, then the dues and the pay form fit the screen', async () => {
    await createPlan(env.server.db);
    const member = await createUser(env.server.db, ['member']);
    const { context, page } = await newPage(env.browser, env.server.baseUrl, { width: 375, height: 740 });
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await duesPage.open(page);
    await page.getByRole('button', { name: 'Pay dues' }).waitFor();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await context.close();
  });

  it('when an admin invites a person, then the invitation arrives by e-mail (read from the SMTP catcher) and its link lets them join', async () => {
    const admin = await createUser(env.server.db, ['member', 'admin'], { name: 'Officer Mail' });
    const email = `mailed-${Date.now()}@test.example`;
    const officer = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(officer.page, admin.email, admin.password);
    await officer.page.waitForURL(/\/today/);
    await membersPage.invite(officer.page, email);
    await officer.context.close();

    const mail = await waitForMailTo(email, () => env.server.jobs.outbox.dispatchDue());
    expect(mail.subject).toContain('invited');
    const link = /https?:\/\/\S+\/invitations\/[A-Za-z0-9_-]+/.exec(mail.text)![0];

    const guest = await newPage(env.browser, env.server.baseUrl);
    await acceptInvitationPage.accept(guest.page, link, 'Hazel Mailed', 'a long enough password');
    await guest.page.waitForURL(/\/today/);
    expect(await shell.heading(guest.page)).toContain('Today');
    await guest.context.close();
  });
});
