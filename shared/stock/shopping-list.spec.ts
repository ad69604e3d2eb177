import { batchBill } from './batch-bill';
import { IngredientName, shoppingList } from './shopping-list';

// Worked example with invented demo figures. A 20 L version uses 4.5 kg malt (id 1), 25 g hops
// (id 2) and 1 pack of yeast (id 3). Batch A is planned at 40 L, batch B at 10 L:
//   malt 9 + 2.25 = 11.25 kg needed, 8 kg on hand → buy 3.25 kg
//   hops 0.05 + 0.0125 = 0.0625 kg needed, 0.1 kg on hand → nothing to buy
//   yeast 2 + ceil(0.5) = 3 packs needed, 1 on hand → buy 2
const version = [
  { ingredientId: 1, unit: 'kg' as const, amount: 4.5 },
  { ingredientId: 2, unit: 'kg' as const, amount: 0.025 },
  { ingredientId: 3, unit: 'each' as const, amount: 1 },
];
const names = new Map<number, IngredientName>([
  [1, { name: 'Demo pale malt', kind: 'fermentables' }],
  [2, { name: 'Demo hop', kind: 'hops' }],
  [3, { name: 'Demo ale yeast', kind: 'yeasts' }],
]);

describe('shoppingList', () => {
  it('equals the planned bills minus stock, grouped by ingredient with the batches that need it', () => {
    const list = shoppingList(
      [
        { batchId: 8, batchName: 'Batch B', brewDate: '2026-12-20', bill: batchBill(version, 20, 10) },
        { batchId: 7, batchName: 'Batch A', brewDate: '2026-12-10', bill: batchBill(version, 20, 40) },
      ],
      [
        { ingredientId: 1, unit: 'kg', onHand: 8 },
        { ingredientId: 2, unit: 'kg', onHand: 0.1 },
        { ingredientId: 3, unit: 'each', onHand: 1 },
      ],
      names,
    );

    expect(list.map(({ ingredientName, needed, inStock, toBuy }) => ({ ingredientName, needed, inStock, toBuy }))).toEqual([
      { ingredientName: 'Demo pale malt', needed: 11.25, inStock: 8, toBuy: 3.25 },
      { ingredientName: 'Demo ale yeast', needed: 3, inStock: 1, toBuy: 2 },
    ]);
    expect(list[0].batches).toEqual([
      { batchId: 7, batchName: 'Batch A', brewDate: '2026-12-10', amount: 9 },
      { batchId: 8, batchName: 'Batch B', brewDate: '2026-12-20', amount: 2.25 },
    ]);
  });

  it('is empty when nothing is planned', () => {
    expect(shoppingList([], [{ ingredientId: 1, unit: 'kg', onHand: 3 }], names)).toEqual([]);
  });
});
