import fc from 'fast-check';
import { massFractionFromDensity } from './mass-fraction-solver';
import { ethanolWaterDensity } from './oiml-density';
import { ScienceRangeError } from '../units/science-range-error';

describe('massFractionFromDensity', () => {
  it('round-trips mass fraction → density → mass fraction within 1e-9 over 0–1 and 0–40 °C', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 40, noNaN: true }),
      (p, t) => Math.abs(massFractionFromDensity(ethanolWaterDensity(p, t), t) - p) < 1e-9));
  });

  it('returns the pure ends exactly at their densities', () => {
    expect(massFractionFromDensity(ethanolWaterDensity(0, 20), 20)).toBeCloseTo(0, 12);
    expect(massFractionFromDensity(ethanolWaterDensity(1, 20), 20)).toBeCloseTo(1, 9);
  });

  // CRC Handbook, ethanol at 20 °C, 50 % by mass at 913.84 kg/m³ (from memory).
  it('gives about 50 % mass for 913.84 kg/m³ at 20 °C', () => {
    expect(Math.abs(massFractionFromDensity(913.84, 20) - 0.5)).toBeLessThan(0.0005);
  });

  it('throws when the density is above that of water at t', () => {
    expect(() => massFractionFromDensity(1005, 20)).toThrow(ScienceRangeError);
  });
});
