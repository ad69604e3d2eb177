import { createBatchesService } from '@server/batches';
import { createRecipesService } from '@server/recipes';
import { createCatalogueEntries, sampleDesign } from '../integration/helpers/catalogue-factory';
import { createUser } from '../integration/helpers/user-factory';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { signInPage } from './helpers/pages';
import { dismissSnackBar } from './helpers/recipes-pages';
import { shoppingListPage, stockPage } from './helpers/stock-pages';

const inDays = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

// Invented demo figures: the sample recipe is 20 L with 4.5 kg malt; the planned batch is 40 L, so
// its bill holds 9 kg malt; 5 kg are received, so 4 kg are short.
describe('Stock in the browser', () => {
  const env = useE2eEnvironment();

  it('when a brewer receives too little malt for a planned batch, then the shopping list shows the shortfall and drawing asks before recording it', async () => {
    const brewer = await createUser(env.server.db, ['member', 'brewer'], { name: 'Bo Brewer' });
    const ids = await createCatalogueEntries(env.server.db);
    const owner = { id: brewer.id, email: brewer.email, name: 'Bo Brewer', roles: brewer.roles };
    const recipes = createRecipesService(env.server.db);
    const recipe = await recipes.create(owner, sampleDesign(ids, `Stock pale ${ids.tag}`), 'coop');
    const batch = await createBatchesService(env.server.db, recipes).create(owner, {
      name: `Planned pale ${ids.tag}`, recipeId: recipe.id, recipeVersion: 1, brewDate: inDays(7), plannedVolumeLitres: 40, fermenterId: null,
    });
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, brewer.email, brewer.password);
    await page.waitForURL(/\/today/);

    await page.getByRole('navigation').getByRole('link', { name: 'Stock' }).click();
    await page.getByRole('heading', { level: 1, name: 'Stock' }).waitFor();
    await stockPage.receive(page, { ingredient: `Test pale malt ${ids.tag}`, quantity: '5', bestBefore: inDays(200), note: 'Demo supplier (invented)' });
    await page.getByRole('region', { name: 'Stock lots' }).getByRole('row').filter({ hasText: `Test pale malt ${ids.tag}` }).getByText('5 kg of 5 kg').waitFor();
    await dismissSnackBar(page);
    await page.getByLabel('Search ingredients and supplier notes').fill(`no such thing ${ids.tag}`);
    await page.getByText(`No lots match “no such thing ${ids.tag}”.`).waitFor();
    expect(await seriousA11yViolations(page)).toEqual([]);

    await page.getByRole('link', { name: 'What to buy' }).click();
    await page.getByRole('heading', { level: 1, name: 'What to buy' }).waitFor();
    const malt = shoppingListPage.row(page, `Test pale malt ${ids.tag}`);
    await malt.waitFor();
    expect(await malt.locator('td[data-label="Needed"]').textContent()).toBe('9 kg');
    expect(await malt.locator('td[data-label="In stock"]').textContent()).toBe('5 kg');
    expect(await malt.locator('td[data-label="To buy"]').textContent()).toBe('4 kg');
    expect(await malt.getByRole('link', { name: `Planned pale ${ids.tag}` }).count()).toBe(1);
    expect(await page.getByRole('link', { name: 'Download CSV' }).getAttribute('href')).toMatch(/^\/api\/stock\/shopping-list\/export\?from=/);
    expect(await seriousA11yViolations(page)).toEqual([]);

    // Starting the batch (moving it to brewing) offers the draw on its own.
    await page.goto(`/batches/${batch.id}`);
    await page.getByRole('button', { name: 'Draw from stock' }).waitFor();
    await page.getByRole('button', { name: 'Move to brewing' }).click();
    const dialog = page.getByRole('dialog', { name: 'Draw from stock' });
    await dialog.getByText('Short by 4 kg').waitFor();
    expect(await dialog.getByRole('button', { name: 'Draw' }).isDisabled()).toBe(true);
    await dialog.getByRole('checkbox', { name: 'Draw what there is and record the shortfall' }).check();
    await dialog.getByRole('button', { name: 'Draw' }).click();
    await dialog.getByText('Drawn from stock, with the shortfall recorded.').waitFor();
    const lots = await env.server.db('stock_lots').join('fermentables', 'fermentables.ingredient_id', 'stock_lots.ingredient_id').where('fermentables.id', ids.fermentableId);
    expect(lots.map((l) => Number(l.quantity_on_hand))).toEqual([0]);
    await dialog.getByRole('button', { name: 'Close' }).click();

    await stockPage.open(page);
    await page.getByRole('button', { name: new RegExp(`^History of lot \\d+ of Test pale malt ${ids.tag}$`) }).click();
    const history = page.getByRole('dialog', { name: /^History of lot/ });
    await history.getByText('Received +5 kg').waitFor();
    await history.getByText('Drawn −5 kg').waitFor();
    await history.getByText(`for Planned pale ${ids.tag}`, { exact: false }).waitFor();
    expect(await seriousA11yViolations(page)).toEqual([]);
    await context.close();
  }, 120_000);

  it('when a member opens Stock on a 375 px phone, then each lot is a card with its figures and its history, and nothing to change', async () => {
    const brewer = await createUser(env.server.db, ['member', 'brewer']);
    const member = await createUser(env.server.db, ['member']);
    const ids = await createCatalogueEntries(env.server.db);
    const { ingredient_id: ingredientId } = (await env.server.db('hops').where({ id: ids.hopId }).first())!;
    await env.server.db('stock_lots').insert({
      ingredient_id: ingredientId, unit: 'kg', received_quantity: 0.1, quantity_on_hand: 0.1, received_on: inDays(-3), best_before: inDays(90), supplier_note: 'Demo (invented)', created_by_user_id: brewer.id,
    });
    const { context, page } = await newPage(env.browser, env.server.baseUrl, { width: 375, height: 740 });
    await signInPage.signIn(page, member.email, member.password);
    await page.waitForURL(/\/today/);
    await stockPage.open(page);
    const card = page.getByRole('region', { name: 'Stock lots' }).getByRole('row').filter({ hasText: `Test hop ${ids.tag}` });
    await card.getByText('100 g of 100 g').waitFor();
    const box = await card.boundingBox();
    expect(box!.width).toBeLessThanOrEqual(375);
    expect(await page.getByRole('button', { name: 'Receive a lot' }).count()).toBe(0);
    expect(await card.getByRole('button').allTextContents()).toEqual(['History']);
    await context.close();
  }, 120_000);
});
