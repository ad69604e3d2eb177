import { Knex } from 'knex';
import { batchBill, PlannedBill, ShoppingList, shoppingList } from '@shared/stock';
import { stockBillsRepository } from './stock-bills.repository';
import { stockLevelsRepository } from './stock-levels.repository';

/** What to buy for the planned batches brewing in a horizon: their bills minus what is on hand. */
export async function shoppingListFor(db: Knex, from: string, to: string): Promise<ShoppingList> {
  const batches = await stockBillsRepository.plannedBetween(db, from, to);
  const withRecipe = batches.filter((batch) => batch.recipeVersionId !== null && batch.versionVolumeLitres !== null);
  const items = await stockBillsRepository.versionItems(db, [...new Set(withRecipe.map((batch) => batch.recipeVersionId!))]);
  const planned: PlannedBill[] = withRecipe.map((batch) => ({
    batchId: batch.id,
    batchName: batch.name,
    brewDate: batch.brewDate,
    bill: batchBill(items.get(batch.recipeVersionId!)!, batch.versionVolumeLitres!, batch.batchVolumeLitres),
  }));
  const ingredientIds = [...new Set(planned.flatMap((batch) => batch.bill.map((line) => line.ingredientId)))];
  const [totals, names] = await Promise.all([stockLevelsRepository.totals(db), stockBillsRepository.ingredientNames(db, ingredientIds)]);
  return { from, to, batchCount: planned.length, batchesWithoutRecipe: batches.length - withRecipe.length, lines: shoppingList(planned, totals, names) };
}
