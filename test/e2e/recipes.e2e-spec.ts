import { randomUUID } from 'node:crypto';
import { createCatalogueEntries } from '../integration/helpers/catalogue-factory';
import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { signInPage } from './helpers/pages';
import { cataloguePage, dismissSnackBar, recipeEditorPage, recipeVersionsPage } from './helpers/recipes-pages';

describe('Recipes in the browser', () => {
  const env = useE2eEnvironment();

  it('when a member builds a recipe from the catalogue, adds a hop, saves, scales and compares, then predictions follow and the versions differ', async () => {
    const member = await createUser(env.server.db, ['member'], { name: 'Rowan Recipe' });
    const { tag } = await createCatalogueEntries(env.server.db);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);

    await recipeEditorPage.openNew(page);
    await recipeEditorPage.name(page, `Porch pale ${tag}`);
    expect(await recipeEditorPage.shown(page, 'og')).toBe('–');
    await recipeEditorPage.addFermentable(page, `Test pale malt ${tag} · grain`, '4.5');
    await recipeEditorPage.chooseYeast(page, `Test yeast ${tag} (72–78 %)`);
    await recipeEditorPage.waitForChange(page, 'og', '–');
    const ogWithMalt = await recipeEditorPage.shown(page, 'og');
    expect(Number(ogWithMalt)).toBeGreaterThan(1.03);
    expect(await recipeEditorPage.shown(page, 'ibu')).toBe('0');

    await recipeEditorPage.addHop(page, `Test hop ${tag} · 10 % AA · pellet`, '25', '60');
    await recipeEditorPage.waitForChange(page, 'ibu', '0');
    expect(Number(await recipeEditorPage.shown(page, 'ibu'))).toBeGreaterThan(10);
    expect(await recipeEditorPage.shown(page, 'og')).toBe(ogWithMalt);
    expect(await seriousA11yViolations(page)).toEqual([]);

    await recipeEditorPage.save(page, 1);
    await page.waitForURL(/\/recipes\/\d+$/);
    const ibuAt20 = await recipeEditorPage.shown(page, 'ibu');

    await recipeEditorPage.scale(page, '40');
    await recipeEditorPage.waitForBatchVolume(page, '40');
    expect(await recipeEditorPage.shown(page, 'og')).toBe(ogWithMalt);
    expect(await recipeEditorPage.shown(page, 'ibu')).toBe(ibuAt20);
    await recipeEditorPage.save(page, 2);

    await recipeVersionsPage.open(page);
    const comparison = await recipeVersionsPage.compare(page);
    const row = (heading: string | RegExp) => comparison.locator('tr').filter({ has: page.locator('th', { hasText: heading }) });
    expect(await row('Batch volume').textContent()).toMatch(/20 L\s*40 L\s*changed/);
    expect(await row(`Test pale malt ${tag}`).textContent()).toMatch(/4\.5 kg\s*9 kg\s*changed/);
    expect(await row(/^OG$/).textContent()).not.toContain('changed');
    await dismissSnackBar(page);
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 90_000);

  it('when a brewer imports a CSV of hops with a bad row, then each problem is shown by line and nothing is imported until the file is fixed', async () => {
    const brewer = await createUser(env.server.db, ['member', 'brewer']);
    const tag = randomUUID().slice(0, 8);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, brewer.email, brewer.password);
    await page.waitForURL(/\/today/);
    await cataloguePage.open(page, 'Hops');

    const bad = `name,alphaAcidPercent,form\nCsv hop A ${tag},5.5,pellet\nCsv hop B ${tag},lots,cone\n`;
    await cataloguePage.chooseCsv(page, 'CSV file of hops', bad);
    const problems = await cataloguePage.problems(page);
    expect(problems.length).toBeGreaterThan(0);
    expect(problems.every((problem) => problem.startsWith('Line 3:'))).toBe(true);
    expect(await page.getByRole('button', { name: /^Import \d+ hops$/ }).isDisabled()).toBe(true);
    expect(await env.server.db('hops').where('name', 'like', `%${tag}`).count({ n: '*' })).toEqual([{ n: 0 }]);
    expect(await seriousA11yViolations(page)).toEqual([]);

    await page.getByRole('button', { name: 'Discard' }).click();
    await cataloguePage.chooseCsv(page, 'CSV file of hops', `name,alphaAcidPercent,form\nCsv hop A ${tag},5.5,pellet\nCsv hop B ${tag},7,whole\n`);
    await page.getByRole('button', { name: 'Import 2 hops' }).click();
    await page.getByRole('rowheader', { name: `Csv hop B ${tag}` }).waitFor();
    expect(await env.server.db('hops').where('name', 'like', `%${tag}`).count({ n: '*' })).toEqual([{ n: 2 }]);
    await context.close();
  }, 90_000);

  it('when a member opens a recipe another member keeps private, then it is said once with the way back; once shared, they can view and clone it but not edit it', async () => {
    const owner = await createUser(env.server.db, ['member'], { name: 'Owner Member' });
    const other = await createUser(env.server.db, ['member'], { name: 'Other Member' });
    const ids = await createCatalogueEntries(env.server.db);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, owner.email, owner.password);
    await page.waitForURL(/\/today/);
    await recipeEditorPage.openNew(page);
    await recipeEditorPage.name(page, `Shared mild ${ids.tag}`);
    await recipeEditorPage.addFermentable(page, `Test pale malt ${ids.tag} · grain`, '3');
    await recipeEditorPage.save(page, 1);
    await page.waitForURL(/\/recipes\/\d+/);
    const url = page.url();

    const second = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(second.page, other.email, other.password);
    await second.page.waitForURL(/\/today/);
    // While it is private the other member is told once, on the page and not again in a snack bar, with the way back.
    await second.page.goto(new URL(url).pathname);
    const unavailable = second.page.getByText('No recipe you can see has this id.');
    await unavailable.waitFor();
    expect(await unavailable.count()).toBe(1);
    expect(await second.page.locator('mat-snack-bar-container').count()).toBe(0);
    expect(await second.page.getByLabel('Recipe name').count()).toBe(0);
    await second.page.getByRole('link', { name: 'Back to the recipes' }).click();
    await second.page.getByRole('heading', { level: 1, name: 'Recipes' }).waitFor();

    await page.getByRole('switch', { name: 'Shared with the co-op' }).click();
    await page.getByText(/· shared with the co-op/).waitFor();
    await context.close();
    await second.page.goto(new URL(url).pathname);
    await second.page.getByText('only its owner edits it').waitFor();
    expect(await second.page.getByRole('button', { name: 'Save', exact: true }).count()).toBe(0);
    expect(await second.page.getByLabel('Recipe name').isDisabled()).toBe(true);
    await second.page.getByRole('button', { name: 'Clone' }).click();
    await second.page.getByRole('heading', { level: 1, name: `Shared mild ${ids.tag} (copy)` }).waitFor();
    expect(await second.page.getByRole('button', { name: 'Save', exact: true }).count()).toBe(1);
    await second.context.close();
  }, 90_000);

  it('when a member uses a 375 px wide phone, then the predictions sit below the form and the brew-day sheet carries its cautions', async () => {
    const member = await createUser(env.server.db, ['member']);
    const ids = await createCatalogueEntries(env.server.db);
    const { context, page } = await newPage(env.browser, env.server.baseUrl, { width: 375, height: 740 });
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await recipeEditorPage.openNew(page);
    await recipeEditorPage.name(page, `Phone pale ${ids.tag}`);
    await recipeEditorPage.addFermentable(page, `Test pale malt ${ids.tag} · grain`, '4');
    await recipeEditorPage.addHop(page, `Test hop ${ids.tag} · 10 % AA · pellet`, '20', '60');
    const form = await page.getByRole('form', { name: 'Recipe' }).boundingBox();
    const panel = await page.getByRole('region', { name: 'Predictions' }).boundingBox();
    expect(panel!.y).toBeGreaterThan(form!.y + form!.height - 1);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    expect(await seriousA11yViolations(page)).toEqual([]);
    await recipeEditorPage.save(page, 1);

    await page.getByRole('link', { name: 'Print' }).click();
    await page.getByRole('heading', { level: 1, name: `Brew day: Phone pale ${ids.tag}` }).waitFor();
    const cautions = page.getByRole('complementary', { name: 'Cautions' });
    expect(await cautions.textContent()).toMatch(/Hot wort and steam[\s\S]*Cleaning chemicals[\s\S]*CO/);
    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('button', { name: 'Print this sheet' }).isVisible()).toBe(false);
    expect(await page.locator('mat-toolbar').isVisible()).toBe(false);
    await page.emulateMedia({ media: 'screen' });
    await dismissSnackBar(page);
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 90_000);
});
