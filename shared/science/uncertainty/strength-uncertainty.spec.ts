import { hydrometerStrengthUncertainty, refractometerStrengthUncertainty } from './strength-uncertainty';

describe('hydrometerStrengthUncertainty', () => {
  // By hand: the 131.25 rule with two readings each u = 0.001/√12 gives 131.25 × √2 × 0.000289 = 0.0536 % vol;
  // a thermometer read to 0.5 °C adds ~0.0001 SG-equivalent at most, so u stays within 0.053–0.056.
  it('propagates hydrometer and thermometer resolution into the linear estimate', () => {
    const result = hydrometerStrengthUncertainty({ ogReading: 1.05, fgReading: 1.01, ogTemperature: 20, fgTemperature: 20 });
    expect(result.linearEstimate.standardUncertainty).toBeGreaterThan(0.053);
    expect(result.linearEstimate.standardUncertainty).toBeLessThan(0.056);
  });

  it('gives the density-based figure an uncertainty of the same order', () => {
    const result = hydrometerStrengthUncertainty({ ogReading: 1.05, fgReading: 1.01 });
    expect(result.densityBased.standardUncertainty).toBeGreaterThan(0.03);
    expect(result.densityBased.standardUncertainty).toBeLessThan(0.1);
  });

  it('grows with a coarser hydrometer', () => {
    const fine = hydrometerStrengthUncertainty({ ogReading: 1.05, fgReading: 1.01 });
    const coarse = hydrometerStrengthUncertainty({ ogReading: 1.05, fgReading: 1.01, hydrometerResolution: 0.002 });
    expect(coarse.densityBased.standardUncertainty).toBeGreaterThan(1.9 * fine.densityBased.standardUncertainty);
  });
});

describe('refractometerStrengthUncertainty', () => {
  it('gives a finite, positive uncertainty for a typical pair of readings', () => {
    const result = refractometerStrengthUncertainty(13, 6.5);
    expect(result.densityBased.standardUncertainty).toBeGreaterThan(0);
    expect(Number.isFinite(result.densityBased.value)).toBe(true);
  });
});
