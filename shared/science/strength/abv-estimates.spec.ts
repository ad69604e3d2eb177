import { abvLinearEstimate, abvNonLinearEstimate } from './abv-estimates';

describe('ABV estimates', () => {
  // Common practice, hand-worked: (1.050 − 1.010) × 131.25 = 5.25 % vol.
  it('gives 5.25 % vol for 1.050 → 1.010 by the 131.25 rule', () => {
    expect(abvLinearEstimate(1.05, 1.01)).toBeCloseTo(5.25, 10);
  });

  // Common practice, hand-worked: 76.08 × 0.040 / 0.725 × 1.010 / 0.794 = 5.339.
  it('gives 5.339 % vol for 1.050 → 1.010 by the non-linear formula', () => {
    expect(abvNonLinearEstimate(1.05, 1.01)).toBeCloseTo(5.339, 3);
  });

  it('throws when FG is above OG', () => {
    expect(() => abvLinearEstimate(1.04, 1.05)).toThrow(/fg = 1.05 SG must not be above og = 1.04 SG/);
  });

  it('throws when OG is NaN', () => {
    expect(() => abvNonLinearEstimate(Number.NaN, 1.01)).toThrow(/og = NaN/);
  });
});
