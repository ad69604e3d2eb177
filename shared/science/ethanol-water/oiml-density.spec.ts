import fc from 'fast-check';
import { ethanolWaterDensity, pureEthanolDensity } from './oiml-density';
import { ScienceRangeError } from '../units/science-range-error';

describe('ethanolWaterDensity (OIML R 22)', () => {
  // OIML R 22 (1975), International Alcoholometric Tables, Table I at 20 °C; from memory.
  it('gives 998.20 kg/m³ for pure water and 789.24 kg/m³ for pure ethanol at 20 °C', () => {
    expect(ethanolWaterDensity(0, 20)).toBeCloseTo(998.2, 2);
    expect(ethanolWaterDensity(1, 20)).toBeCloseTo(789.24, 2);
  });

  // Pure-water end against an independent source: Tanaka et al. 2001 (Metrologia 38), from memory.
  it.each([[0, 999.8428], [10, 999.7026], [30, 995.6488], [40, 992.2152]])(
    'agrees with the Tanaka water density at %p °C within 0.02 kg/m³', (t, tanaka) => {
      expect(Math.abs(ethanolWaterDensity(0, t) - tanaka)).toBeLessThan(0.02);
    });

  // Pure ethanol at other temperatures, CRC Handbook (density of ethanol vs temperature), from memory.
  it.each([[0, 806.25], [25, 785.1], [40, 772.0]])('gives pure ethanol near %p °C → %p kg/m³ within 0.2', (t, rho) => {
    expect(Math.abs(pureEthanolDensity(t) - rho)).toBeLessThan(0.2);
  });

  // CRC Handbook, "Concentrative properties of aqueous solutions", ethanol at 20 °C, from memory;
  // an older data set than OIML R 22, so agreement within 0.1 kg/m³ is expected, not identity.
  it.each([[0.1, 981.87], [0.2, 968.64], [0.3, 953.82], [0.4, 935.18], [0.5, 913.84], [0.6, 891.13], [0.7, 867.66], [0.8, 843.44]])(
    'at mass fraction %p and 20 °C is near the handbook %p kg/m³', (p, rho) => {
      expect(Math.abs(ethanolWaterDensity(p, 20) - rho)).toBeLessThan(0.1);
    });

  it('falls as ethanol rises at fixed temperature', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 0.999, noNaN: true }), fc.double({ min: 0, max: 40, noNaN: true }),
      (p, t) => ethanolWaterDensity(p + 0.001, t) < ethanolWaterDensity(p, t)));
  });

  it('falls as temperature rises at fixed composition above 4 °C', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 4, max: 39.9, noNaN: true }),
      (p, t) => ethanolWaterDensity(p, t + 0.1) < ethanolWaterDensity(p, t)));
  });

  it('rises from 0 °C to 2 °C for pure water (maximum near 4 °C)', () => {
    expect(ethanolWaterDensity(0, 2)).toBeGreaterThan(ethanolWaterDensity(0, 0));
  });

  it('throws a ScienceRangeError outside 0–1 mass fraction or 0–40 °C', () => {
    expect(() => ethanolWaterDensity(1.2, 20)).toThrow(ScienceRangeError);
    expect(() => ethanolWaterDensity(0.5, 41)).toThrow(/temperature = 41 °C .* 0 to 40 °C/);
  });
});
