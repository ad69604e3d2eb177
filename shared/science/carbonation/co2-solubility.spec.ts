import { co2VolumesPerAtm, gaugePressureForVolumes, volumesAtGaugePressure } from './co2-solubility';

describe('CO2 solubility', () => {
  // Sander's compilation (2015): kH = 0.034 mol/(L·atm) at 25 °C; × 22.26 L/mol at STP = 0.757 vol/atm.
  it('gives 0.757 volumes per atm at 25 °C', () => {
    expect(co2VolumesPerAtm(25)).toBeCloseTo(0.757, 3);
  });

  it('round-trips volumes → gauge pressure → volumes', () => {
    expect(volumesAtGaugePressure(gaugePressureForVolumes(2.4, 5), 5)).toBeCloseTo(2.4, 12);
  });

  it('dissolves more CO2 in colder beer', () => {
    expect(co2VolumesPerAtm(2)).toBeGreaterThan(co2VolumesPerAtm(20));
  });
});
