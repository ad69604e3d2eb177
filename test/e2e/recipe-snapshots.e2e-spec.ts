import { createCatalogueService } from '@server/catalogue/catalogue.service';
import { createRecipesService } from '@server/recipes';
import { createCatalogueEntries, sampleDesign } from '../integration/helpers/catalogue-factory';
import { createUser, TestUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { signInPage } from './helpers/pages';
import { cataloguePage, dismissSnackBar, recipeEditorPage, recipeVersionsPage } from './helpers/recipes-pages';

describe('Saved versions keep what they were made with', () => {
  const env = useE2eEnvironment();
  const session = (user: TestUser, name: string) => ({ id: user.id, email: user.email, name, roles: user.roles });

  it("when a brewer raises a hop's alpha acid, then the saved recipe keeps its IBU and its owner can update to the catalogue as a new version", async () => {
    const member = await createUser(env.server.db, ['member'], { name: 'Sage Snapshot' });
    const brewer = await createUser(env.server.db, ['member', 'brewer']);
    const ids = await createCatalogueEntries(env.server.db);
    const recipe = await createRecipesService(env.server.db).create(session(member, 'Sage Snapshot'), sampleDesign(ids, `Snapshot pale ${ids.tag}`), 'private');
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await page.goto(`/recipes/${recipe.id}`);
    await page.getByText('Version 1 ·').waitFor();
    const savedIbu = await recipeEditorPage.shown(page, 'ibu');
    expect(await page.getByRole('region', { name: /catalogue has changed/ }).count()).toBe(0);

    await createCatalogueService(env.server.db).update(brewer.id, 'hops', ids.hopId, { alphaAcidPercent: 13 });
    await page.reload();
    const offer = page.getByRole('region', { name: 'The catalogue has changed since version 1' });
    await offer.waitFor();
    expect(await offer.textContent()).toContain(`Test hop ${ids.tag}: alpha acid (%) 10 → 13`);
    expect(await recipeEditorPage.shown(page, 'ibu')).toBe(savedIbu);
    expect(await seriousA11yViolations(page)).toEqual([]);

    await offer.getByRole('button', { name: "Update to the catalogue's current values" }).click();
    await page.getByText('Version 2 ·').waitFor();
    await offer.waitFor({ state: 'detached' });
    // Tinseth's IBU is proportional to the alpha acid: 10 % → 13 % raises it by 30 %.
    expect(Number(await recipeEditorPage.shown(page, 'ibu'))).toBeCloseTo(Number(savedIbu) * 1.3, -0.5);

    await dismissSnackBar(page);
    await recipeVersionsPage.open(page);
    const comparison = await recipeVersionsPage.compare(page);
    const row = (heading: string) => comparison.locator('tr').filter({ has: page.locator('th', { hasText: heading }) });
    expect(await row('IBU').textContent()).toMatch(new RegExp(`${savedIbu}\\s*\\d+\\s*changed`));
    expect(await row(`Test hop ${ids.tag}`).last().textContent()).toMatch(/alpha acid 10 %\s*pellet, alpha acid 13 %\s*changed/);
    await context.close();
  }, 90_000);

  it('when a brewer looks at a hop and retires it, then "used in" names the recipe and the retire asks first', async () => {
    const member = await createUser(env.server.db, ['member']);
    const brewer = await createUser(env.server.db, ['member', 'brewer']);
    const ids = await createCatalogueEntries(env.server.db);
    const recipe = await createRecipesService(env.server.db).create(session(member, 'Used-in owner'), sampleDesign(ids, `Used-in pale ${ids.tag}`), 'coop');
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, brewer.email, brewer.password);
    await page.waitForURL(/\/today/);
    await cataloguePage.open(page, 'Hops');

    await page.getByRole('button', { name: `Used in: Test hop ${ids.tag}` }).click();
    const panel = page.getByTestId('usage-panel');
    await panel.getByRole('link', { name: `Used-in pale ${ids.tag}` }).waitFor();
    expect(await panel.textContent()).toMatch(/version 1\s*\(current version\)/);
    await panel.getByRole('button', { name: 'Close' }).click();

    await page.getByRole('button', { name: `Retire Test hop ${ids.tag}` }).click();
    await panel.getByRole('alert').waitFor();
    expect(await panel.getByRole('alert').textContent()).toContain(`1 current recipe uses Test hop ${ids.tag}`);
    expect(await env.server.db('hops').where({ id: ids.hopId }).first()).toMatchObject({ retired_at: null });
    expect(await seriousA11yViolations(page)).toEqual([]);
    await panel.getByRole('button', { name: `Retire Test hop ${ids.tag}` }).click();
    await panel.waitFor({ state: 'detached' });
    expect((await env.server.db('hops').where({ id: ids.hopId }).first())!.retired_at).not.toBeNull();
    expect(recipe.version).toBe(1);
    await context.close();
  }, 90_000);
});
