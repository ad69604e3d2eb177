import type { Knex } from 'knex';
import { stockLotsRepository } from '../server/stock/stock-lots.repository';
import { stockLevelsRepository } from '../server/stock/stock-levels.repository';

// A little demo stock (quantities, dates and suppliers invented): enough malt for the planned mild,
// too few hops and no yeast for it, so the shopping list has something to show, and one small lot
// of malt whose best-before is near, so Today shows a brewer the alerts.
const DEMO_LOTS: { table: string; name: string; unit: 'kg' | 'each'; quantity: number; receivedDay: number; bestBeforeDay: number | null; note: string }[] = [
  { table: 'fermentables', name: 'Pale ale malt', unit: 'kg', quantity: 25, receivedDay: -40, bestBeforeDay: 200, note: 'Demo supplier: Hollow Lane Maltings (invented)' },
  { table: 'fermentables', name: 'Pale ale malt', unit: 'kg', quantity: 2, receivedDay: -300, bestBeforeDay: 20, note: 'Opened sack, demo (invented)' },
  { table: 'fermentables', name: 'Crystal malt 60 °L', unit: 'kg', quantity: 1, receivedDay: -40, bestBeforeDay: 200, note: 'Demo supplier (invented)' },
  { table: 'hops', name: 'English aroma hop', unit: 'kg', quantity: 0.03, receivedDay: -60, bestBeforeDay: 300, note: 'Vacuum pack, demo (invented)' },
];

const day = (fromNow: number) => new Date(Date.now() + fromNow * 86_400_000).toISOString().slice(0, 10);

/** Adds the demo stock once, when there are no lots and the demo brewer and catalogue exist. */
export async function seed(knex: Knex): Promise<void> {
  const existing = await knex('stock_lots').count<{ count: number }[]>({ count: '*' });
  if (Number(existing[0].count) > 0) return;
  const brewer = await knex('users').where({ email: 'tomas@fernhollow.example' }).first('id');
  if (!brewer) return;
  for (const lot of DEMO_LOTS) {
    const entry = await knex(lot.table).where({ name: lot.name }).first('ingredient_id');
    if (!entry) continue;
    await stockLotsRepository.insert(knex, {
      ingredientId: entry.ingredient_id, unit: lot.unit, quantity: lot.quantity, receivedOn: day(lot.receivedDay),
      bestBefore: lot.bestBeforeDay === null ? null : day(lot.bestBeforeDay), supplierNote: lot.note, userId: brewer.id,
    });
  }
  const malt = await knex('fermentables').where({ name: 'Pale ale malt' }).first('ingredient_id');
  if (malt) await stockLevelsRepository.setReorderLevel(knex, malt.ingredient_id, 'kg', 10);
  // 30 g on hand against a 50 g level: Today shows brewers the low-stock alert too.
  const hop = await knex('hops').where({ name: 'English aroma hop' }).first('ingredient_id');
  if (hop) await stockLevelsRepository.setReorderLevel(knex, hop.ingredient_id, 'kg', 0.05);
}
