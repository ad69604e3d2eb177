import fc from 'fast-check';
import {
  ethanolGramsPerLitre, massFractionFromMoleFraction, massFractionFromPercentVolume, massFractionFromVolumeFractionBeforeMixing,
  moleFractionFromMassFraction, percentVolumeFromMassFraction, restatePercentVolume, volumeFractionBeforeMixing,
} from './concentration';
import { ethanolWaterDensity } from './oiml-density';

describe('% vol and % mass (OIML R 22)', () => {
  // OIML R 22 (1975) Table IIIa (% mass from % vol at 20 °C), from memory.
  it.each([[40, 33.3], [50, 42.43], [96, 93.84]])('%p %% vol at 20 °C is %p %% mass within 0.02', (vol, mass) => {
    expect(Math.abs(100 * massFractionFromPercentVolume(vol, 20) - mass)).toBeLessThan(0.02);
  });

  // US gauging tables (proof at 60 °F vs % by weight), from memory: 100 proof = 50 % vol at 60 °F = 42.49 % by weight.
  it('gives 42.49 % mass for 50 % vol at 60 °F within 0.02', () => {
    expect(Math.abs(100 * massFractionFromPercentVolume(50, (60 - 32) / 1.8) - 42.49)).toBeLessThan(0.02);
  });

  // Well-known table value: 40 % vol at 20 °C has a density near 948 kg/m³ (from memory).
  it('puts 40 % vol at about 948 kg/m³ at 20 °C', () => {
    expect(Math.abs(ethanolWaterDensity(massFractionFromPercentVolume(40, 20), 20) - 948)).toBeLessThan(0.2);
  });

  it('gives 0 and 100 % vol at the pure ends at any t', () => {
    expect(percentVolumeFromMassFraction(0, 10)).toBe(0);
    expect(percentVolumeFromMassFraction(1, 30)).toBeCloseTo(100, 10);
  });

  it('round-trips % vol at 20 °C → 15 °C → 20 °C within 1e-7', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 100, noNaN: true }), (v) =>
      Math.abs(restatePercentVolume(restatePercentVolume(v, 20, 15), 15, 20) - v) < 1e-7));
  });

  it('round-trips mole fraction and volume fraction before mixing within 1e-12', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), (p) =>
      Math.abs(massFractionFromMoleFraction(moleFractionFromMassFraction(p)) - p) < 1e-12
      && Math.abs(massFractionFromVolumeFractionBeforeMixing(volumeFractionBeforeMixing(p, 20), 20) - p) < 1e-12));
  });

  it('puts the volume fraction before mixing below % vol/100 (the mix contracts)', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 0.99, noNaN: true }), (p) =>
      volumeFractionBeforeMixing(p, 20) < percentVolumeFromMassFraction(p, 20) / 100));
  });

  // Molar masses 46.069 and 18.015 g/mol (IUPAC atomic weights): 50 % mass → x = (50/46.069)/(50/46.069 + 50/18.015).
  it('gives mole fraction 0.2811 for 50 % mass', () => {
    expect(moleFractionFromMassFraction(0.5)).toBeCloseTo(0.2811, 4);
  });

  it('gives 789.24 g/L for pure ethanol at 20 °C (OIML R 22, from memory)', () => {
    expect(ethanolGramsPerLitre(1, 20)).toBeCloseTo(789.24, 2);
  });
});
