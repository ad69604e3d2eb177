import fc from 'fast-check';
import { guessMassFraction } from './density-guide';
import { ethanolWaterDensity } from './oiml-density';

describe('guessMassFraction', () => {
  it('starts within 1e-3 of the true mass fraction over 0–1 and 0–40 °C', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 40, noNaN: true }), (p, t) => {
      const water = ethanolWaterDensity(0, t);
      const share = (water - ethanolWaterDensity(p, t)) / (water - ethanolWaterDensity(1, t));
      return Math.abs(guessMassFraction(share, t) - p) < 1e-3;
    }));
  });

  it('returns the pure ends at shares 0 and 1', () => {
    expect(guessMassFraction(0, 15)).toBe(0);
    expect(guessMassFraction(1, 15)).toBeCloseTo(1, 12);
  });
});
