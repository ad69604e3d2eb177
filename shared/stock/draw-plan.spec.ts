import { DrawableLot, firstExpiringFirst, hasShortfall, planDraw } from './draw-plan';

// Invented demo figures; the rule under test is first-expiring-first (common practice in stores:
// use the oldest best-before first) and that a draw never takes more than a lot holds.
const lot = (id: number, onHand: number, bestBefore: string | null, receivedOn = '2026-10-01', ingredientId = 1): DrawableLot => ({
  id, ingredientId, unit: 'kg', onHand, bestBefore, receivedOn,
});

describe('first-expiring-first', () => {
  it('orders by best-before, lots without one last, then by the older delivery and the lower id', () => {
    const lots = [lot(1, 1, null), lot(2, 1, '2027-03-01'), lot(3, 1, '2026-12-20', '2026-11-01'), lot(4, 1, '2026-12-20', '2026-10-01'), lot(5, 1, null, '2026-09-01')];

    expect([...lots].sort(firstExpiringFirst).map((l) => l.id)).toEqual([4, 3, 2, 5, 1]);
  });

  it('takes the earliest best-before lot first and only then the next one', () => {
    const plan = planDraw([{ ingredientId: 1, unit: 'kg', amount: 5 }], [lot(10, 4, '2027-06-01'), lot(11, 3, '2027-01-15')]);

    expect(plan[0].takes).toEqual([{ lotId: 11, quantity: 3 }, { lotId: 10, quantity: 2 }]);
    expect(plan[0]).toMatchObject({ drawn: 5, shortfall: 0 });
    expect(hasShortfall(plan)).toBe(false);
  });

  it('never takes a lot of another ingredient or another unit', () => {
    const plan = planDraw([{ ingredientId: 1, unit: 'kg', amount: 1 }], [lot(20, 9, '2026-12-01', '2026-10-01', 2), { ...lot(21, 9, '2026-12-01'), unit: 'L' }]);

    expect(plan[0].takes).toEqual([]);
    expect(plan[0].shortfall).toBe(1);
  });
});

describe('shortfall', () => {
  it('draws everything there is and reports the rest as short, never below zero', () => {
    const plan = planDraw([{ ingredientId: 1, unit: 'kg', amount: 4.5 }], [lot(30, 1.2, '2027-01-01'), lot(31, 2, '2027-02-01')]);

    expect(plan[0].takes).toEqual([{ lotId: 30, quantity: 1.2 }, { lotId: 31, quantity: 2 }]);
    expect(plan[0].drawn).toBe(3.2);
    expect(plan[0].shortfall).toBe(1.3);
    expect(hasShortfall(plan)).toBe(true);
  });

  it('shares one lot between two lines of one ingredient without counting it twice', () => {
    const plan = planDraw(
      [{ ingredientId: 1, unit: 'kg', amount: 2 }, { ingredientId: 1, unit: 'kg', amount: 2 }],
      [lot(40, 3, '2027-01-01')],
    );

    expect(plan.map((line) => line.drawn)).toEqual([2, 1]);
    expect(plan[1].shortfall).toBe(1);
  });

  it('shows the whole line short when there is no stock at all', () => {
    const plan = planDraw([{ ingredientId: 7, unit: 'each', amount: 2 }], []);

    expect(plan[0]).toMatchObject({ drawn: 0, shortfall: 2, takes: [] });
  });
});
