import { distillateStrengthUncertainty } from './distillate-uncertainty';

describe('distillateStrengthUncertainty', () => {
  // By hand: OIML R 22 tables near 5 % vol (from memory) change by about 1.35 kg/m³ per % vol, so a
  // density read to 0.1 kg/m³ alone gives u ≈ (0.1/1.35)/√12 = 0.021 % vol; volumes and temperature add a little.
  it('gives about 0.02–0.03 % vol for a 5 % beer with a 0.1 kg/m³ density meter', () => {
    const result = distillateStrengthUncertainty(0.1, 0.1, 991.1, 20);
    expect(result.standardUncertainty).toBeGreaterThan(0.015);
    expect(result.standardUncertainty).toBeLessThan(0.035);
  });

  it('shrinks with a finer density meter', () => {
    const coarse = distillateStrengthUncertainty(0.1, 0.1, 991.1, 20, { densityResolution: 0.1 });
    const fine = distillateStrengthUncertainty(0.1, 0.1, 991.1, 20, { densityResolution: 0.01 });
    expect(fine.standardUncertainty).toBeLessThan(coarse.standardUncertainty);
  });
});
