import { Browser } from 'playwright-core';
import { createCatalogueEntries } from '../integration/helpers/catalogue-factory';
import { createUser } from '../integration/helpers/user-factory';
import { launchBrowser, newPage, seriousA11yViolations } from './helpers/browser';
import { E2eServer, startE2eServer } from './helpers/e2e-server';
import { signInPage } from './helpers/pages';
import { recipeEditorPage, recipeVersionsPage } from './helpers/recipes-pages';

describe('Recipes in the browser', () => {
  let server: E2eServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;

  beforeAll(async () => {
    server = await startE2eServer();
    ({ browser, close: closeBrowser } = await launchBrowser());
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.stop();
  });

  it('when a member builds a recipe from the catalogue, adds a hop, saves, scales and compares, then predictions follow and the versions differ', async () => {
    const member = await createUser(server.db, ['member'], { name: 'Rowan Recipe' });
    const { tag } = await createCatalogueEntries(server.db);
    const { context, page } = await newPage(browser, server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);

    await recipeEditorPage.openNew(page);
    await recipeEditorPage.name(page, `Porch pale ${tag}`);
    expect(await recipeEditorPage.shown(page, 'og')).toBe('–');
    await recipeEditorPage.addFermentable(page, `Test pale malt ${tag} · grain`, '4.5');
    await recipeEditorPage.chooseYeast(page, `Test yeast ${tag} (72–78 %)`);
    const ogWithMalt = await recipeEditorPage.shown(page, 'og');
    expect(Number(ogWithMalt)).toBeGreaterThan(1.03);
    expect(await recipeEditorPage.shown(page, 'ibu')).toBe('0');

    await recipeEditorPage.addHop(page, `Test hop ${tag} · 10 % AA · pellet`, '25', '60');
    await page.getByTestId('prediction-ibu').filter({ hasNotText: /^0$/ }).waitFor();
    expect(Number(await recipeEditorPage.shown(page, 'ibu'))).toBeGreaterThan(10);
    expect(await recipeEditorPage.shown(page, 'og')).toBe(ogWithMalt);
    expect(await seriousA11yViolations(page)).toEqual([]);

    await recipeEditorPage.save(page, 1);
    await page.waitForURL(/\/recipes\/\d+$/);
    const ibuAt20 = await recipeEditorPage.shown(page, 'ibu');

    await recipeEditorPage.scale(page, '40');
    expect(await page.getByLabel('Batch volume', { exact: true }).inputValue()).toBe('40');
    expect(await recipeEditorPage.shown(page, 'og')).toBe(ogWithMalt);
    expect(await recipeEditorPage.shown(page, 'ibu')).toBe(ibuAt20);
    await recipeEditorPage.save(page, 2);

    await recipeVersionsPage.open(page);
    const comparison = await recipeVersionsPage.compare(page);
    const row = (heading: string | RegExp) => comparison.locator('tr').filter({ has: page.locator('th', { hasText: heading }) });
    expect(await row('Batch volume').textContent()).toMatch(/20 L\s*40 L\s*changed/);
    expect(await row(`Test pale malt ${tag}`).textContent()).toMatch(/4\.5 kg\s*9 kg\s*changed/);
    expect(await row(/^OG$/).textContent()).not.toContain('changed');
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 90_000);
});
