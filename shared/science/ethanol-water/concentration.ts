import { requireInRange } from '../units/range-guard';
import type { Celsius, MassFraction } from '../units/unit-types';
import { ETHANOL_MOLAR_MASS, WATER_MOLAR_MASS } from './molar-masses';
import { massFractionFromEthanolConcentration } from './mass-fraction-solver';
import { ethanolWaterDensity, pureEthanolDensity, requireOimlRange } from './oiml-density';

/** % vol at t (ethanol volume at t over mixture volume at t, after mixing) from mass fraction. */
export function percentVolumeFromMassFraction(massFraction: MassFraction, temperature: Celsius): number {
  requireOimlRange(massFraction, temperature);
  return (100 * massFraction * ethanolWaterDensity(massFraction, temperature)) / pureEthanolDensity(temperature);
}

/** Mass fraction from % vol at t, the inverse of percentVolumeFromMassFraction. */
export function massFractionFromPercentVolume(percentVolume: number, temperature: Celsius): MassFraction {
  requireInRange('percentVolume', percentVolume, 0, 100, '% vol');
  requireOimlRange(0, temperature);
  return massFractionFromEthanolConcentration((percentVolume / 100) * pureEthanolDensity(temperature), temperature);
}

/** Ethanol concentration in g/L (mass of ethanol per litre of mixture at t) from mass fraction. */
export function ethanolGramsPerLitre(massFraction: MassFraction, temperature: Celsius): number {
  return massFraction * ethanolWaterDensity(massFraction, temperature);
}

/** Mole fraction of ethanol from mass fraction. */
export function moleFractionFromMassFraction(massFraction: MassFraction): number {
  requireInRange('massFraction', massFraction, 0, 1, '');
  const ethanolMoles = massFraction / ETHANOL_MOLAR_MASS;
  return ethanolMoles / (ethanolMoles + (1 - massFraction) / WATER_MOLAR_MASS);
}

/** Mass fraction of ethanol from mole fraction. */
export function massFractionFromMoleFraction(moleFraction: number): MassFraction {
  requireInRange('moleFraction', moleFraction, 0, 1, '');
  const ethanolMass = moleFraction * ETHANOL_MOLAR_MASS;
  return ethanolMass / (ethanolMass + (1 - moleFraction) * WATER_MOLAR_MASS);
}

/**
 * Volume fraction before mixing: ethanol volume over the sum of the separate pure volumes at t.
 * It is below % vol/100 because the mix contracts.
 */
export function volumeFractionBeforeMixing(massFraction: MassFraction, temperature: Celsius): number {
  requireOimlRange(massFraction, temperature);
  const ethanolVolume = massFraction / pureEthanolDensity(temperature);
  const waterVolume = (1 - massFraction) / ethanolWaterDensity(0, temperature);
  return ethanolVolume === 0 ? 0 : ethanolVolume / (ethanolVolume + waterVolume);
}

/** Mass fraction from a volume fraction before mixing at t. */
export function massFractionFromVolumeFractionBeforeMixing(volumeFraction: number, temperature: Celsius): MassFraction {
  requireInRange('volumeFraction', volumeFraction, 0, 1, '');
  requireOimlRange(0, temperature);
  const ethanolMass = volumeFraction * pureEthanolDensity(temperature);
  const waterMass = (1 - volumeFraction) * ethanolWaterDensity(0, temperature);
  return ethanolMass / (ethanolMass + waterMass);
}

/** % vol stated at one temperature restated at another (same liquid, both volumes measured at the new t). */
export function restatePercentVolume(percentVolume: number, fromTemperature: Celsius, toTemperature: Celsius): number {
  requireOimlRange(0, toTemperature);
  return percentVolumeFromMassFraction(massFractionFromPercentVolume(percentVolume, fromTemperature), toTemperature);
}
