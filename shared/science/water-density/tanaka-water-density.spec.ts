import fc from 'fast-check';
import { waterDensity } from './tanaka-water-density';
import { ScienceRangeError } from '../units/science-range-error';

describe('waterDensity (Tanaka et al. 2001)', () => {
  // Tanaka et al., Metrologia 38 (2001) 301, Table of SMOW density; values from memory, to 0.001 kg/m³.
  it.each([
    [0, 999.8428], [4, 999.975], [10, 999.7026], [15, 999.1026], [20, 998.2067],
    [25, 997.047], [30, 995.6488], [40, 992.2152],
  ])('at %p °C is %p kg/m³', (t, expected) => {
    expect(waterDensity(t)).toBeCloseTo(expected, 3);
  });

  it('has its maximum near 3.98 °C (Tanaka et al. 2001: −a1 = 3.983035 °C)', () => {
    expect(waterDensity(3.983)).toBeGreaterThan(waterDensity(3.5));
    expect(waterDensity(3.983)).toBeGreaterThan(waterDensity(4.5));
  });

  it('falls as temperature rises above 4 °C', () => {
    fc.assert(fc.property(fc.double({ min: 4, max: 39.9, noNaN: true }), (t) => waterDensity(t + 0.1) < waterDensity(t)));
  });

  it('throws outside 0–40 °C', () => {
    expect(() => waterDensity(45)).toThrow(ScienceRangeError);
    expect(() => waterDensity(Number.NaN)).toThrow(/NaN/);
  });
});
