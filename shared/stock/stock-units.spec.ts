import { stockAmountText, toStockQuantity } from './stock-units';

describe('stock units', () => {
  it('stores typed quantities in kg, L or a count', () => {
    // 1 lb = 0.45359237 kg and 1 oz = 28.349523125 g exactly (international yard and pound agreement, 1959).
    expect(toStockQuantity(2, 'lb')).toEqual({ unit: 'kg', quantity: 0.90718474 });
    expect(toStockQuantity(1, 'oz').quantity).toBeCloseTo(0.028349523125, 12);
    expect(toStockQuantity(250, 'g')).toEqual({ unit: 'kg', quantity: 0.25 });
    expect(toStockQuantity(500, 'mL')).toEqual({ unit: 'L', quantity: 0.5 });
  });

  it('shows malt in kg or lb, hops in g or oz and small other additions in g or mL', () => {
    expect(stockAmountText('fermentables', 'kg', 4.5, 'metric')).toBe('4.5 kg');
    expect(stockAmountText('hops', 'kg', 0.025, 'metric')).toBe('25 g');
    expect(stockAmountText('hops', 'kg', 0.028349523125, 'us')).toBe('1 oz');
    expect(stockAmountText('others', 'kg', 0.012, 'metric')).toBe('12 g');
    expect(stockAmountText('others', 'L', 0.25, 'us')).toBe('250 mL');
    expect(stockAmountText('yeasts', 'each', 2, 'metric')).toBe('2 each');
  });
});
