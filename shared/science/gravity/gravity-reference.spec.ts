import fc from 'fast-check';
import { hydrometerTemperatureCorrection, restateSpecificGravity, sg2020FromSg6060, sg6060FromSg2020 } from './gravity-reference';

describe('hydrometerTemperatureCorrection', () => {
  it('leaves a reading at the calibration temperature unchanged', () => {
    expect(hydrometerTemperatureCorrection(1.05, 20, 20)).toBeCloseTo(1.05, 12);
  });

  // Common practice: hydrometer correction charts for a 60 °F instrument add about +0.002 to
  // +0.003 at 80 °F (from memory).
  it('adds about 0.002–0.003 to a 1.040 reading at 80 °F on a 60 °F hydrometer', () => {
    const corrected = hydrometerTemperatureCorrection(1.04, (80 - 32) / 1.8, (60 - 32) / 1.8);
    expect(corrected - 1.04).toBeGreaterThan(0.002);
    expect(corrected - 1.04).toBeLessThan(0.003);
  });

  it('corrects pure water read at any t to 1.000 (ratio of Tanaka densities)', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 40, noNaN: true }), fc.double({ min: 10, max: 30, noNaN: true }), (t, cal) => {
      // A hydrometer in pure water at t, ignoring the glass, reads rho(t)/rho(cal): the ratio of the Tanaka values.
      const rho = (x: number) => 999.97495 * (1 - ((x - 3.983035) ** 2 * (x + 301.797)) / (522528.9 * (x + 69.34881)));
      return Math.abs(hydrometerTemperatureCorrection(rho(t) / rho(cal), t, cal) - 1) < 1e-12;
    }));
  });
});

describe('SG reference temperatures', () => {
  it('round-trips 20/20 → 60/60 → 20/20 within 1e-12', () => {
    fc.assert(fc.property(fc.double({ min: 0.99, max: 1.17, noNaN: true }), (sg) => Math.abs(sg2020FromSg6060(sg6060FromSg2020(sg)) - sg) < 1e-12));
  });

  it('keeps water at exactly 1 on any reference', () => {
    expect(restateSpecificGravity(1, 20, 4)).toBe(1);
  });

  it('puts SG 60/60 within 0.0001 of SG 20/20 for a 12 °P wort (the scales differ in the fourth decimal)', () => {
    expect(Math.abs(sg6060FromSg2020(1.0484) - 1.0484)).toBeLessThan(1e-4);
  });
});
