import { finalGravityFromAttenuation, originalGravityMetric, originalGravityUs } from './original-gravity';
import { ScienceRangeError } from '../units/science-range-error';

describe('originalGravityMetric', () => {
  // Common practice: sucrose yields about 46 gravity points per pound per US gallon (1 lb in 1 gal → ~1.046).
  it('gives about 1.046 for 1 lb of sucrose (100 % yield) made up to 1 US gallon', () => {
    const sg = originalGravityMetric([{ kilograms: 0.45359237, extractYieldPercent: 100 }], 100, 3.785411784);
    expect(Math.abs(sg - 1.046)).toBeLessThan(0.0008);
  });

  it('scales with efficiency: half the efficiency gives about half the points', () => {
    const full = originalGravityMetric([{ kilograms: 4, extractYieldPercent: 80 }], 80, 20) - 1;
    const half = originalGravityMetric([{ kilograms: 4, extractYieldPercent: 80 }], 40, 20) - 1;
    expect(half / full).toBeGreaterThan(0.49);
    expect(half / full).toBeLessThan(0.51);
  });

  it('throws a ScienceRangeError for a bill beyond 40 °P', () => {
    expect(() => originalGravityMetric([{ kilograms: 50, extractYieldPercent: 80 }], 80, 20)).toThrow(ScienceRangeError);
  });
});

describe('originalGravityUs', () => {
  // Hand-worked (common practice): 10 lb × 37 PPG × 0.75 ÷ 5 gal = 55.5 points → 1.0555.
  it('gives 1.0555 for 10 lb at 37 PPG, 75 %, 5 gal', () => {
    expect(originalGravityUs([{ pounds: 10, pointsPerPoundPerGallon: 37 }], 75, 5)).toBeCloseTo(1.0555, 10);
  });
});

describe('finalGravityFromAttenuation', () => {
  // Hand-worked: 50 points × (1 − 0.75) = 12.5 points → 1.0125.
  it('gives 1.0125 for OG 1.050 at 75 % apparent attenuation', () => {
    expect(finalGravityFromAttenuation(1.05, 75)).toBeCloseTo(1.0125, 12);
  });
});
