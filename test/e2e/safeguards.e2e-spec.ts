import { createCatalogueEntries } from '../integration/helpers/catalogue-factory';
import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { signInPage } from './helpers/pages';
import { inSight, pageWidth, PHONE } from './helpers/phone';
import { cataloguePage, recipeEditorPage } from './helpers/recipes-pages';

describe('Recipe editor safeguards in the browser', () => {
  const env = useE2eEnvironment();

  it('when a member leaves the editor with unsaved edits, then the page marks them and asks first; staying keeps the edits', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { tag } = await createCatalogueEntries(env.server.db);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await recipeEditorPage.openNew(page);
    expect(await page.getByTestId('unsaved-marker').count()).toBe(0);

    await recipeEditorPage.name(page, `Half-done stout ${tag}`);
    await recipeEditorPage.addFermentable(page, `Test pale malt ${tag} · grain`, '4');
    await page.getByTestId('unsaved-marker').waitFor();
    await page.getByRole('link', { name: 'Today' }).click();

    const dialog = page.getByRole('alertdialog', { name: 'Leave without saving?' });
    await dialog.waitFor();
    expect(await seriousA11yViolations(page)).toEqual([]);
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await dialog.waitFor({ state: 'detached' });
    expect(page.url()).toMatch(/\/recipes\/new$/);
    expect(await page.getByLabel('Recipe name').inputValue()).toBe(`Half-done stout ${tag}`);

    await page.getByRole('link', { name: 'Today' }).click();
    await page.getByRole('alertdialog').getByRole('button', { name: 'Discard changes' }).click();
    await page.waitForURL(/\/today/);
    await context.close();
  }, 90_000);

  it('when a member closes the tab with unsaved edits, then the browser asks first; without edits it does not', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { tag } = await createCatalogueEntries(env.server.db);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    const asked: string[] = [];
    page.on('dialog', (dialog) => {
      asked.push(dialog.type());
      void dialog.dismiss();
    });

    await recipeEditorPage.openNew(page);
    // A click first: the browser asks before unloading only a page the person has interacted with.
    await page.getByLabel('Recipe name').click();
    await recipeEditorPage.name(page, `Tab-closed porter ${tag}`);
    await page.getByTestId('unsaved-marker').waitFor();
    await page.close({ runBeforeUnload: true });
    await page.waitForTimeout(500);
    // Dismissed: the tab stays open with the edits.
    expect(asked).toEqual(['beforeunload']);
    expect(page.isClosed()).toBe(false);
    expect(await page.getByLabel('Recipe name').inputValue()).toBe(`Tab-closed porter ${tag}`);

    const fresh = await context.newPage();
    const freshAsked: string[] = [];
    fresh.on('dialog', (dialog) => {
      freshAsked.push(dialog.type());
      void dialog.dismiss();
    });
    await recipeEditorPage.openNew(fresh);
    await fresh.getByLabel('Recipe name').click();
    await fresh.close({ runBeforeUnload: true });
    await fresh.waitForEvent('close', { timeout: 10_000 });
    expect(freshAsked).toEqual([]);
    await context.close();
  }, 90_000);

  it('when a member types on a 375 px phone, then OG, FG, both ABV figures, IBU and colour stay in sight and follow the typing', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { tag } = await createCatalogueEntries(env.server.db);
    const { context, page } = await newPage(env.browser, env.server.baseUrl, { width: 375, height: 740 });
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await recipeEditorPage.openNew(page);
    await recipeEditorPage.addFermentable(page, `Test pale malt ${tag} · grain`, '4.5');
    await recipeEditorPage.chooseYeast(page, `Test yeast ${tag} (72–78 %)`);
    await recipeEditorPage.addHop(page, `Test hop ${tag} · 10 % AA · pellet`, '20', '60');
    const summary = page.locator('cw-prediction-summary');
    const ibuBefore = (await summary.getByTestId('summary-ibu').textContent())?.trim();

    const hopAmount = page.getByRole('group', { name: /^Hop addition \d+$/ }).last().getByLabel('Amount');
    await hopAmount.fill('40');
    await summary.getByTestId('summary-ibu').filter({ hasNotText: ibuBefore }).waitFor();

    const box = (await summary.boundingBox())!;
    const field = (await hopAmount.boundingBox())!;
    const fullPanel = (await page.getByRole('heading', { name: 'Predictions' }).boundingBox())!;
    expect(fullPanel.y).toBeGreaterThan(740);
    expect(box.y).toBeGreaterThanOrEqual(0);
    expect(box.y + box.height).toBeLessThanOrEqual(field.y);
    for (const figure of ['og', 'fg', 'abv', 'ibu', 'colour']) {
      expect(await summary.getByTestId(`summary-${figure}`).isVisible()).toBe(true);
      expect((await summary.getByTestId(`summary-${figure}`).textContent())?.trim()).not.toMatch(/^–/);
    }
    expect((await summary.getByTestId('summary-og').textContent())?.trim()).toBe(await recipeEditorPage.shown(page, 'og'));
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);

    await summary.getByRole('button').click();
    await page.waitForFunction(() => document.activeElement?.getAttribute('aria-labelledby') === 'cw-prediction-title');
    expect(await page.getByRole('heading', { name: 'Predictions' }).isVisible()).toBe(true);
    await context.close();
  }, 90_000);
});

describe('Members safeguards in the browser', () => {
  const env = useE2eEnvironment();

  it('when an admin removes her own admin role, then she is warned that she loses access, and cancelling keeps the role', async () => {
    const admin = await createUser(env.server.db, ['member', 'admin'], { name: 'Careful Admin' });
    await createUser(env.server.db, ['member', 'admin'], { name: 'Second Admin' });
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, admin.email, admin.password);
    await page.waitForURL(/\/today/);
    await page.goto('/members');
    await page.getByLabel('Find a member by name or e-mail').fill(admin.email);
    const ownAdmin = page.getByRole('button', { name: 'admin role for Careful Admin' });

    await ownAdmin.click();
    const dialog = page.getByRole('alertdialog', { name: 'Remove your own admin role?' });
    await dialog.waitFor();
    expect(await dialog.textContent()).toContain('You will lose access to the Members page');
    expect(await seriousA11yViolations(page)).toEqual([]);
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await dialog.waitFor({ state: 'detached' });

    expect(await ownAdmin.getAttribute('aria-pressed')).toBe('true');
    expect(await env.server.db('user_roles').where({ user_id: admin.id, role: 'admin' })).toHaveLength(1);

    await ownAdmin.click();
    await page.getByRole('alertdialog').getByRole('button', { name: 'Remove my admin role' }).click();
    await page.getByText('Saved the changes to Careful Admin.').waitFor();
    expect(await env.server.db('user_roles').where({ user_id: admin.id, role: 'admin' })).toHaveLength(0);
    await context.close();
  }, 90_000);
});

describe('Phone-width lists and the brew-day sheet', () => {
  const env = useE2eEnvironment();

  it('when a member uses a 375 px phone, then the recipe list reads as cards and the brew-day sheet fits the screen', async () => {
    const member = await createUser(env.server.db, ['member']);
    const { tag } = await createCatalogueEntries(env.server.db);
    const { context, page } = await newPage(env.browser, env.server.baseUrl, { width: 375, height: 740 });
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await recipeEditorPage.openNew(page);
    await recipeEditorPage.name(page, `Pocket porter with a rather long name ${tag}`);
    await recipeEditorPage.addFermentable(page, `Test pale malt ${tag} · grain`, '4');
    await recipeEditorPage.addHop(page, `Test hop ${tag} · 10 % AA · pellet`, '20', '60');
    await recipeEditorPage.save(page, 1);

    await page.getByRole('link', { name: 'Print' }).click();
    await page.getByRole('heading', { level: 1, name: /^Brew day: Pocket porter/ }).waitFor();
    const sheetOverflow = await page.evaluate(() =>
      [...document.querySelectorAll('.cw-sheet table, .cw-sheet h1, .cw-sheet p')].filter((each) => each.getBoundingClientRect().right > window.innerWidth + 0.5).length,
    );
    expect(sheetOverflow).toBe(0);

    await page.goto('/recipes');
    const card = page.getByRole('row').filter({ hasText: `Pocket porter with a rather long name ${tag}` });
    await card.waitFor();
    const box = (await card.boundingBox())!;
    expect(box.x).toBeGreaterThanOrEqual(0);
    expect(box.x + box.width).toBeLessThanOrEqual(375);
    expect(await card.textContent()).toMatch(/\d{1,2} \w{3} \d{4}, \d{2}:\d{2}/);
    await page.getByLabel('Search recipes').fill('zzzz');
    await page.getByText('No recipes match “zzzz”.').waitFor();
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 120_000);

  it('when an admin uses a 375 px phone, then a member and a catalogue entry read as cards with their e-mail, roles and figures in sight', async () => {
    const { tag } = await createCatalogueEntries(env.server.db);
    const name = `Phone Admin ${tag}`;
    const admin = await createUser(env.server.db, ['member', 'admin'], { name });
    const { context, page } = await newPage(env.browser, env.server.baseUrl, PHONE);
    await signInPage.signIn(page, admin.email, admin.password);
    await page.waitForURL(/\/today/);

    await page.goto('/members');
    await page.getByRole('heading', { level: 1, name: 'Members' }).waitFor();
    await page.getByLabel('Find a member by name or e-mail').fill(name);
    const memberCard = page.getByRole('row').filter({ hasText: name });
    await memberCard.waitFor();
    expect(await inSight(memberCard.getByText(admin.email))).toBe(true);
    expect(await inSight(memberCard.getByRole('group', { name: `Roles of ${name}` }))).toBe(true);
    expect(await pageWidth(page)).toBeLessThanOrEqual(PHONE.width);

    await cataloguePage.open(page, 'Hops');
    const hopCard = page.getByRole('row').filter({ hasText: `Test hop ${tag}` });
    await hopCard.waitFor();
    expect(await inSight(hopCard.getByText('10 %', { exact: true }))).toBe(true);
    expect(await inSight(hopCard.getByText('pellet', { exact: true }))).toBe(true);
    expect(await pageWidth(page)).toBeLessThanOrEqual(PHONE.width);
    await context.close();
  }, 120_000);
});
