import fc from 'fast-check';
import { strengthBreakdown } from './density-abv';

describe('strengthBreakdown', () => {
  it('reports % vol as ABW × beer density ÷ 789.24 kg/m³ (OIML R 22 pure ethanol at 20 °C)', () => {
    const s = strengthBreakdown(1.05, 1.01);
    expect(s.percentVolume20).toBeCloseTo((s.alcoholByMass * s.beerDensity20) / 789.24, 3);
  });

  // A 12 °P wort fermented to 2.5 °P, hand-worked from Balling's relations: ABW 4.0146 % m/m;
  // SG of 2.5 °P ≈ 1.0098 (Plato table, from memory) → % vol ≈ 4.0146 × 1.0098 × 998.2 / 789.24 = 5.127.
  it('gives about 5.13 % vol for 12 °P → 2.5 °P', () => {
    const og = 1.04838;
    const fg = 1.00978;
    expect(Math.abs(strengthBreakdown(og, fg).percentVolume20 - 5.127)).toBeLessThan(0.02);
  });

  it('keeps every intermediate finite and ordered OE > RE > AE for a fermented beer', () => {
    fc.assert(fc.property(fc.double({ min: 1.02, max: 1.14, noNaN: true }), fc.double({ min: 0.5, max: 0.95, noNaN: true }), (og, att) => {
      const fg = 1 + (og - 1) * (1 - att);
      const s = strengthBreakdown(og, fg);
      return Object.values(s).every(Number.isFinite) && s.originalExtract > s.realExtract && s.realExtract > s.apparentExtract;
    }));
  });

  it('reports both estimates beside the density-based figure with their gaps', () => {
    const s = strengthBreakdown(1.05, 1.01);
    expect(s.linearEstimate - s.estimateGap).toBeCloseTo(s.percentVolume20, 12);
    expect(s.nonLinearEstimate - s.nonLinearGap).toBeCloseTo(s.percentVolume20, 12);
  });

  // Product brief: the linear rule drifts from the density-based figure, more for strong beers.
  it('shows a larger estimate gap for a strong beer than for a light one at the same attenuation', () => {
    const light = strengthBreakdown(1.04, 1.01);
    const strong = strengthBreakdown(1.1, 1.025);
    expect(Math.abs(strong.estimateGap)).toBeGreaterThan(Math.abs(light.estimateGap));
  });
});
