import { ShoppingList } from '@shared/stock';
import { csvOfCells } from '../http/csv-cells';

const HEADER = ['Ingredient', 'Kind', 'Unit', 'Needed', 'In stock', 'To buy', 'Needed by'];

/** The list as CSV: one line per ingredient, quantities in its stored unit (kg, L or each). */
export function shoppingListCsv(list: ShoppingList): string {
  const rows = list.lines.map((line) => [
    line.ingredientName,
    line.ingredientKind,
    line.unit,
    String(line.needed),
    String(line.inStock),
    String(line.toBuy),
    line.batches.map((need) => `${need.batchName} (${need.brewDate}): ${need.amount}`).join('; '),
  ]);
  return csvOfCells([HEADER, ...rows]);
}
