import { strengthBreakdown } from './density-abv';
import { strengthFromBeerDensity } from './measured-density-abv';

describe('strengthFromBeerDensity', () => {
  // Tanaka et al. 2001: water at 20 °C is 998.2067 kg/m³, so a beer of FG 1.010 (20/20) is 1008.19 kg/m³ at 20 °C.
  it('agrees with the 20 °C breakdown when the density is read at 20 °C', () => {
    const measured = strengthFromBeerDensity(1.05, 1.01, 1.01 * 998.2067, 20);
    expect(measured.percentVolume20).toBeCloseTo(strengthBreakdown(1.05, 1.01).percentVolume20, 6);
  });

  // Tanaka et al. 2001: water is 999.7026 kg/m³ at 10 °C; the beer read cold is denser, and the
  // figure restated to 20 °C stays within 0.05 % vol of the 20 °C reading.
  it('restates a reading taken at 10 °C to within 0.05 % vol of the 20 °C figure', () => {
    const cold = strengthFromBeerDensity(1.05, 1.01, 1.01 * 999.7026, 10);
    expect(cold.percentVolumeAtT).not.toBeCloseTo(cold.percentVolume20, 3);
    expect(Math.abs(cold.percentVolume20 - strengthBreakdown(1.05, 1.01).percentVolume20)).toBeLessThan(0.05);
  });

  it('throws for a beer density outside 950–1200 kg/m³', () => {
    expect(() => strengthFromBeerDensity(1.05, 1.01, 900, 20)).toThrow(/beerDensity = 900 kg\/m³/);
  });
});
