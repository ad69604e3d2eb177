import { batchBill } from './batch-bill';

// Scaling a bill by volume is linear (common practice for a recipe brewed on the same kit); the
// figures are invented demo values checked by hand arithmetic.
describe('batchBill', () => {
  it('scales mass and volume lines by batch volume over version volume and adds lines of one ingredient', () => {
    const bill = batchBill(
      [
        { ingredientId: 1, unit: 'kg', amount: 4.5 },
        { ingredientId: 2, unit: 'kg', amount: 0.025 },
        { ingredientId: 2, unit: 'kg', amount: 0.015 },
        { ingredientId: 3, unit: 'L', amount: 0.005 },
      ],
      20,
      30,
    );

    // 4.5 × 30/20 = 6.75; (0.025 + 0.015) × 1.5 = 0.06; 0.005 × 1.5 = 0.0075.
    expect(bill).toEqual([
      { ingredientId: 1, unit: 'kg', amount: 6.75 },
      { ingredientId: 2, unit: 'kg', amount: 0.06 },
      { ingredientId: 3, unit: 'L', amount: 0.0075 },
    ]);
  });

  it('rounds counted items up to whole pieces, and leaves an exact count alone', () => {
    expect(batchBill([{ ingredientId: 4, unit: 'each', amount: 1 }], 20, 23)[0].amount).toBe(2);
    expect(batchBill([{ ingredientId: 4, unit: 'each', amount: 1 }], 20, 10)[0].amount).toBe(1);
    expect(batchBill([{ ingredientId: 4, unit: 'each', amount: 3 }], 30, 30)[0].amount).toBe(3);
  });

  it('refuses a volume of zero', () => {
    expect(() => batchBill([], 0, 20)).toThrow(RangeError);
  });
});
