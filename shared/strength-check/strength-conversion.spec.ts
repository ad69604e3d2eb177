import { convertStrength, STRENGTH_QUANTITIES } from './strength-conversion';

describe('convertStrength', () => {
  // OIML R 22 (1975), table IIIa at 20 °C (from memory): 40 % vol ≙ 33.30 % mass, density 948.05 kg/m³.
  it('states 40 % vol at 20 °C as 33.3 % mass and 948.1 kg/m³ at 20 °C', () => {
    const result = convertStrength('percentVolume20', 40, 20);
    expect(result.massPercent).toBeCloseTo(33.3, 1);
    expect(result.density).toBeCloseTo(948.05, 1);
    expect(result.percentVolumeAtT).toBeCloseTo(40, 10);
  });

  // Ethanol 789.24 g/L pure at 20 °C (OIML R 22), so 40 % vol carries 0.40 × 789.24 = 315.7 g/L.
  it('gives grams per litre as % vol times the density of pure ethanol', () => {
    expect(convertStrength('percentVolume20', 40, 20).gramsPerLitre).toBeCloseTo(0.4 * 789.24, 0);
  });

  // The contraction: 40 mL ethanol + 60 mL water make about 96.4–96.7 mL (common practice), so the
  // volume fraction before mixing is below % vol.
  it('puts the volume fraction before mixing below % vol, as the mix contracts', () => {
    const result = convertStrength('percentVolume20', 40, 20);
    expect(result.volumeFractionBeforeMixingPercent).toBeLessThan(40);
    expect(result.volumeFractionBeforeMixingPercent).toBeGreaterThan(38);
  });

  it.each(STRENGTH_QUANTITIES)('comes back to the same mixture from %s', (quantity) => {
    const start = convertStrength('massPercent', 37, 12);
    const value = {
      percentVolume20: start.percentVolume20, massPercent: start.massPercent, moleFraction: start.moleFraction,
      volumeFractionBeforeMixing: start.volumeFractionBeforeMixingPercent, density: start.density, gramsPerLitre: start.gramsPerLitre,
    }[quantity];
    expect(convertStrength(quantity, value, 12).massPercent).toBeCloseTo(37, 6);
  });

  // % vol depends on the temperature the volumes are measured at: warmer, the mixture expands more than its ethanol share.
  it('tells % vol at t apart from % vol at 20 °C', () => {
    const result = convertStrength('percentVolume20', 40, 30);
    expect(Math.abs(result.percentVolumeAtT - 40)).toBeGreaterThan(0.05);
  });

  it('refuses a temperature outside 0–40 °C', () => {
    expect(() => convertStrength('massPercent', 10, 45)).toThrow(/temperature/);
  });
});
