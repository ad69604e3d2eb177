import { ApiClient } from './helpers/api-client';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';
import { createStockRecipe, planBatch, receiveLot } from './helpers/stock-factory';

// The sample recipe (20 L) uses 4.5 kg malt, 25 g hops, 1 pack of yeast and 1 fining tablet;
// all stock figures here are invented for the tests.
describe('Stock API', () => {
  const t = useTestApp();

  const signedIn = async (roles: ('member' | 'brewer' | 'admin')[] = ['member', 'brewer']) => {
    const user = await createUser(t.db, roles);
    return { user, client: await ApiClient.signedIn(t.app, user) };
  };
  const onHand = async (lotId: number) => Number((await t.db('stock_lots').where({ id: lotId }).first())!.quantity_on_hand);
  const movementSum = async (lotId: number) => Number((await t.db('stock_movements').where({ stock_lot_id: lotId }).sum({ s: 'quantity_change' }))[0].s);

  /** Enough hops, yeast and finings for several batches, so only the malt decides. */
  async function stockTheRest(client: ApiClient, ingredients: { hop: number; yeast: number; fining: number }) {
    await receiveLot(client, ingredients.hop, 'kg', 1);
    await receiveLot(client, ingredients.yeast, 'each', 10);
    await receiveLot(client, ingredients.fining, 'each', 10);
  }

  it('when a bill is drawn, then it takes the earliest best-before lot first, records each movement and audits the draw', async () => {
    const { client } = await signedIn();
    const { ingredients, recipeId } = await createStockRecipe(t.db, client);
    const later = await receiveLot(client, ingredients.malt, 'kg', 5, '2027-09-01');
    const sooner = await receiveLot(client, ingredients.malt, 'kg', 3, '2027-02-01');
    await stockTheRest(client, ingredients);
    const batch = await planBatch(client, recipeId, { plannedVolumeLitres: 20 });

    const preview = (await client.get(`/api/stock/batches/${batch.id}/draw`)).body;
    const maltLine = preview.lines.find((l: { ingredientId: number }) => l.ingredientId === ingredients.malt);
    expect(maltLine.takes).toEqual([{ lotId: sooner.id, quantity: 3, bestBefore: '2027-02-01' }, { lotId: later.id, quantity: 1.5, bestBefore: '2027-09-01' }]);

    const res = await client.send('post', `/api/stock/batches/${batch.id}/draw`, { acceptShortfall: false });
    expect(res.status).toBe(201);
    expect(await onHand(sooner.id)).toBe(0);
    expect(await onHand(later.id)).toBe(3.5);
    expect(await movementSum(later.id)).toBe(3.5);
    const audit = await t.db('audit_log').where({ action: 'stock-drawn', subject_type: 'batch', subject_id: batch.id });
    expect(audit).toHaveLength(1);
    const again = await client.send('post', `/api/stock/batches/${batch.id}/draw`, { acceptShortfall: false });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('stock-draw-blocked');
  });

  it('when stock is short, then the draw is refused with the shortfall and changes nothing; accepted, it draws what there is and records the rest', async () => {
    const { client } = await signedIn();
    const { ingredients, recipeId } = await createStockRecipe(t.db, client);
    const lot = await receiveLot(client, ingredients.malt, 'kg', 2);
    await stockTheRest(client, ingredients);
    const batch = await planBatch(client, recipeId, { plannedVolumeLitres: 20 });

    const refused = await client.send('post', `/api/stock/batches/${batch.id}/draw`, { acceptShortfall: false });
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('stock-shortfall');
    expect(await onHand(lot.id)).toBe(2);
    expect(await t.db('stock_draws').where({ batch_id: batch.id })).toHaveLength(0);

    const accepted = await client.send('post', `/api/stock/batches/${batch.id}/draw`, { acceptShortfall: true });
    expect(accepted.status).toBe(201);
    expect(accepted.body.shortfallAccepted).toBe(true);
    expect(accepted.body.lines.find((l: { ingredientId: number }) => l.ingredientId === ingredients.malt)).toMatchObject({ needed: 4.5, drawn: 2, shortfall: 2.5 });
    expect(await onHand(lot.id)).toBe(0);
  });

  it('when two brewers draw the last lot at once, then exactly one succeeds and the lot ends at zero, never below', async () => {
    const first = await signedIn();
    const second = await signedIn(['member', 'admin']);
    const { ingredients, recipeId } = await createStockRecipe(t.db, first.client);
    const lot = await receiveLot(first.client, ingredients.malt, 'kg', 4.5);
    await stockTheRest(first.client, ingredients);
    const one = await planBatch(first.client, recipeId);
    const two = await planBatch(first.client, recipeId);

    const results = await Promise.all([
      first.client.send('post', `/api/stock/batches/${one.id}/draw`, { acceptShortfall: false }),
      second.client.send('post', `/api/stock/batches/${two.id}/draw`, { acceptShortfall: false }),
    ]);

    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(results.find((r) => r.status === 409)!.body.error.code).toBe('stock-shortfall');
    expect(await onHand(lot.id)).toBe(0);
    expect(await movementSum(lot.id)).toBe(0);
  });

  it('when a lot is adjusted, then the reason is recorded and audited, the history kept, and going below zero is refused', async () => {
    const { client, user } = await signedIn();
    const { ingredients } = await createStockRecipe(t.db, client);
    const lot = await receiveLot(client, ingredients.hop, 'kg', 0.5);

    const spilt = await client.send('post', `/api/stock/lots/${lot.id}/adjustments`, { reason: 'spillage', change: -0.1, note: 'Bag split' });
    expect(spilt.status).toBe(200);
    expect(spilt.body.onHand).toBe(0.4);
    const counted = await client.send('post', `/api/stock/lots/${lot.id}/adjustments`, { reason: 'count', countedQuantity: 0.35 });
    expect(counted.body.onHand).toBe(0.35);
    const tooMuch = await client.send('post', `/api/stock/lots/${lot.id}/adjustments`, { reason: 'spillage', change: -1 });
    expect(tooMuch.status).toBe(409);
    expect(tooMuch.body.error.code).toBe('stock-below-zero');
    expect(await onHand(lot.id)).toBe(0.35);

    const movements = (await client.get(`/api/stock/lots/${lot.id}/movements`)).body;
    expect(movements.map((m: { kind: string; change: number; reason: string | null }) => [m.kind, m.change, m.reason])).toEqual([
      ['receipt', 0.5, null], ['adjustment', -0.1, 'spillage'], ['adjustment', -0.05, 'count'],
    ]);
    const audit = await t.db('audit_log').where({ action: 'stock-lot-adjusted', subject_type: 'stock_lot', subject_id: lot.id }).orderBy('id');
    expect(audit).toHaveLength(2);
    expect(audit[0].actor_user_id).toBe(user.id);
    const detail = typeof audit[0].detail === 'string' ? JSON.parse(audit[0].detail) : audit[0].detail;
    expect(detail).toMatchObject({ reason: 'spillage', note: 'Bag split', before: 0.5, change: -0.1, after: 0.4 });
  });

  it('when a lot is received with bad fields, then it answers 400 naming each and stores nothing', async () => {
    const { user, client } = await signedIn();
    const { ingredients } = await createStockRecipe(t.db, client);
    const res = await client.send('post', '/api/stock/lots', { ingredientId: ingredients.malt, unit: 'g', quantity: -1, receivedOn: '01.12.2026', bestBefore: null });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['quantity', 'receivedOn', 'unit']);
    const wrongUnit = await client.send('post', '/api/stock/lots', { ingredientId: ingredients.yeast, unit: 'kg', quantity: 1, receivedOn: '2026-12-01', bestBefore: null });
    expect(wrongUnit.status).toBe(400);
    expect(wrongUnit.body.fields).toHaveProperty('unit');
    const badReason = await client.send('post', `/api/stock/lots/1/adjustments`, { reason: 'theft', change: -1 });
    expect(badReason.status).toBe(400);
    // Other spec files receive lots meanwhile: only this brewer's count.
    expect(await t.db('stock_lots').where({ created_by_user_id: user.id })).toHaveLength(0);
  });

  it('when a member reads stock, then they see the lots but may not receive or draw', async () => {
    const brewer = await signedIn();
    const member = await signedIn(['member']);
    const { ingredients } = await createStockRecipe(t.db, brewer.client);
    const lot = await receiveLot(brewer.client, ingredients.malt, 'kg', 1);
    const lots = (await member.client.get('/api/stock/lots')).body;
    expect(lots.find((l: { id: number }) => l.id === lot.id)).toMatchObject({ ingredientName: expect.stringContaining('Test pale malt'), ingredientKind: 'fermentables', onHand: 1 });
    const res = await member.client.send('post', '/api/stock/lots', { ingredientId: ingredients.malt, unit: 'kg', quantity: 1, receivedOn: '2026-12-01', bestBefore: null });
    expect(res.status).toBe(403);
  });

  it('when an ingredient is at its reorder level and a lot is near its best-before, then brewers see both alerts and members may not ask', async () => {
    const { client } = await signedIn();
    const member = await signedIn(['member']);
    const { ingredients } = await createStockRecipe(t.db, client);
    const soon = new Date(Date.now() + 10 * 86_400_000).toISOString().slice(0, 10);
    const lot = await receiveLot(client, ingredients.hop, 'kg', 0.2, soon, '2026-11-01');
    await receiveLot(client, ingredients.malt, 'kg', 3, null);
    expect((await client.send('put', `/api/stock/reorder-levels/${ingredients.malt}`, { unit: 'kg', level: 5 })).status).toBe(204);
    expect((await client.send('put', `/api/stock/reorder-levels/${ingredients.yeast}`, { unit: 'each', level: 2 })).status).toBe(204);
    expect((await client.send('put', `/api/stock/reorder-levels/${ingredients.hop}`, { unit: 'kg', level: 0.1 })).status).toBe(204);

    const alerts = (await client.get('/api/stock/alerts')).body;
    const low = alerts.lowStock.filter((l: { ingredientId: number }) => Object.values(ingredients).includes(l.ingredientId));
    // Malt 3 kg ≤ 5 kg and yeast 0 ≤ 2 are low; hops 0.2 kg > 0.1 kg are not.
    expect(low.map((l: { ingredientId: number; onHand: number }) => [l.ingredientId, l.onHand]).sort()).toEqual([[ingredients.malt, 3], [ingredients.yeast, 0]].sort());
    expect(alerts.bestBefore.find((b: { lotId: number }) => b.lotId === lot.id)).toMatchObject({ bestBefore: soon, expired: false, onHand: 0.2 });
    expect((await member.client.get('/api/stock/alerts')).status).toBe(403);
    const audit = await t.db('audit_log').where({ action: 'stock-reorder-level-set', subject_type: 'ingredient', subject_id: ingredients.malt });
    expect(audit).toHaveLength(1);
  });

  it('when a batch has no recipe version, then the draw preview says why and nothing can be drawn', async () => {
    const { client } = await signedIn();
    const res = await client.send('post', '/api/batches', { name: 'No recipe', recipeId: null, recipeVersion: null, brewDate: '2026-11-20', plannedVolumeLitres: 20, fermenterId: null });
    const preview = (await client.get(`/api/stock/batches/${res.body.id}/draw`)).body;
    expect(preview).toMatchObject({ batchId: res.body.id, lines: [], drawn: null, blockedReason: 'This batch has no recipe version, so it has no bill to draw.' });
    const draw = await client.send('post', `/api/stock/batches/${res.body.id}/draw`, { acceptShortfall: true });
    expect(draw.status).toBe(409);
    expect(draw.body.error.code).toBe('stock-draw-blocked');
  });
});
