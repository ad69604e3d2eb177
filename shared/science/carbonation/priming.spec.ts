import { co2VolumesPerAtm } from './co2-solubility';
import { primingSugar, residualCo2 } from './priming';

describe('residualCo2', () => {
  // Common-practice fit, hand-worked at 68 °F: 3.0378 − 0.050062·68 + 0.00026555·68² = 0.8615 vol.
  it('gives 0.86 volumes after a 20 °C fermentation', () => {
    expect(residualCo2(20)).toBeCloseTo(0.8615, 3);
  });

  // Independent check: beer saturated under 1 atm of CO2 by Henry's law (Sander 2015).
  it('agrees with Henry-law saturation at 1 atm within 0.1 volume over 5–25 °C', () => {
    for (const t of [5, 10, 15, 20, 25]) expect(Math.abs(residualCo2(t) - co2VolumesPerAtm(t))).toBeLessThan(0.1);
  });
});

describe('primingSugar', () => {
  // Common practice: about 4 g of sucrose per litre per volume of CO2 (1.977 g/L CO2 ÷ 0.514 g CO2 per g sucrose = 3.84).
  it('asks for about 3.8–4.0 g/L of sucrose per volume still missing', () => {
    const plan = primingSugar(20, 2.5, 20);
    const perVolume = plan.gramsPerLitre / (2.5 - plan.residualVolumes);
    expect(perVolume).toBeGreaterThan(3.8);
    expect(perVolume).toBeLessThan(4.0);
    expect(plan.grams).toBeCloseTo(plan.gramsPerLitre * 20, 12);
  });

  it('needs more dextrose monohydrate than sucrose for the same target', () => {
    expect(primingSugar(20, 2.5, 20, 'dextrose-monohydrate').grams).toBeGreaterThan(primingSugar(20, 2.5, 20, 'sucrose').grams);
  });

  it('flags a target whose warm-bottle pressure is above the common bottle limit', () => {
    expect(primingSugar(20, 4.2, 20).aboveCommonBottleLimit).toBe(true);
    expect(primingSugar(20, 2.4, 20).aboveCommonBottleLimit).toBe(false);
  });

  it('asks for no sugar when the beer already holds the target', () => {
    expect(primingSugar(20, 0.8, 4).grams).toBe(0);
  });
});
