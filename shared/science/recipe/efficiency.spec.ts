import { mashEfficiencyFromBrewhouse } from './efficiency';

describe('mashEfficiencyFromBrewhouse', () => {
  // Common practice bookkeeping: 75 % of the potential reaches 23 L; 24.5 L of the same wort left the boil,
  // so the kettle held 75 × 24.5 / 23 = 79.89 % of the potential.
  it('gives 79.9 % for 75 % into 23 L with 1.5 L left in the kettle', () => {
    expect(mashEfficiencyFromBrewhouse(75, 23, 1.5)).toBeCloseTo(79.891, 3);
  });

  it('equals the brewhouse efficiency when nothing stays in the kettle', () => {
    expect(mashEfficiencyFromBrewhouse(72, 20, 0)).toBe(72);
  });

  it('throws for an empty fermenter', () => {
    expect(() => mashEfficiencyFromBrewhouse(72, 0, 1)).toThrow(/intoFermenterLitres/);
  });
});
