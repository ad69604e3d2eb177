import { addDays, stockAlerts } from './stock-alerts';

describe('stockAlerts', () => {
  const level = (onHand: number, reorderLevel: number | null) => ({ ingredientId: 1, ingredientName: 'Demo malt', ingredientKind: 'fermentables' as const, unit: 'kg' as const, onHand, reorderLevel });
  const lot = (lotId: number, bestBefore: string, onHand = 1) => ({ lotId, ingredientName: 'Demo hop', ingredientKind: 'hops' as const, unit: 'kg' as const, onHand, bestBefore });

  it('flags an ingredient at or below its reorder level, never one without a level', () => {
    const { lowStock } = stockAlerts([level(5, 5), level(5.5, 5), level(0, null)], [], '2026-12-02', 30);

    expect(lowStock.map((l) => l.onHand)).toEqual([5]);
  });

  it('flags lots past or within the warning days, soonest first, and skips emptied lots', () => {
    const { bestBefore } = stockAlerts([], [lot(1, '2027-01-01'), lot(2, '2026-11-30'), lot(3, '2027-01-02'), lot(4, '2026-12-05', 0)], '2026-12-02', 30);

    expect(bestBefore.map((l) => [l.lotId, l.expired])).toEqual([[2, true], [1, false]]);
  });

  it('adds calendar days across a month end', () => {
    expect(addDays('2026-12-02', 30)).toBe('2027-01-01');
  });
});
