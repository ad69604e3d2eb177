import fc from 'fast-check';
import { excessMolarVolume, mixContraction } from './excess-volume';
import { moleFractionFromMassFraction } from './concentration';

describe('excessMolarVolume', () => {
  it('is zero at both pure ends at any temperature', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 40, noNaN: true }), (t) =>
      Math.abs(excessMolarVolume(0, t)) < 1e-12 && Math.abs(excessMolarVolume(1, t)) < 1e-9));
  });

  it('is negative between the ends', () => {
    fc.assert(fc.property(fc.double({ min: 0.001, max: 0.999, noNaN: true }), fc.double({ min: 0, max: 40, noNaN: true }),
      (p, t) => excessMolarVolume(p, t) < 0));
  });

  // Literature excess molar volume of ethanol + water at 25 °C: a minimum near −1.0 to −1.1 cm³/mol
  // at x around 0.3–0.45 (from memory of the calorimetric and densimetric literature).
  it('has its minimum at 25 °C between −1.15 and −1.0 cm³/mol at x 0.25–0.45', () => {
    let min = 0;
    let at = 0;
    for (let p = 0; p <= 1; p += 0.001) {
      const v = excessMolarVolume(p, 25);
      if (v < min) { min = v; at = moleFractionFromMassFraction(p); }
    }
    expect(min).toBeGreaterThan(-1.15);
    expect(min).toBeLessThan(-1.0);
    expect(at).toBeGreaterThan(0.25);
    expect(at).toBeLessThan(0.45);
  });
});

describe('mixContraction', () => {
  // Classroom demonstration, common practice: 50 mL ethanol + 50 mL water give about 96–97 mL.
  it('gives about 96–97 mL from 50 mL ethanol and 50 mL water at 20 °C', () => {
    const mix = mixContraction(0.05, 0.05, 20);
    expect(mix.finalVolume).toBeGreaterThan(0.096);
    expect(mix.finalVolume).toBeLessThan(0.097);
  });

  it('keeps the ethanol volume: % vol × final volume equals the ethanol poured in', () => {
    const mix = mixContraction(0.3, 0.7, 20);
    expect((mix.percentVolume / 100) * mix.finalVolume).toBeCloseTo(0.3, 12);
  });
});
