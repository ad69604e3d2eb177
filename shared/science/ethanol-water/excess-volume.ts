import type { Celsius, MassFraction } from '../units/unit-types';
import { requireInRange, requirePositive } from '../units/range-guard';
import { moleFractionFromMassFraction } from './concentration';
import { ETHANOL_MOLAR_MASS, WATER_MOLAR_MASS } from './molar-masses';
import { ethanolWaterDensity, pureEthanolDensity } from './oiml-density';

/** Excess molar volume at x from a mixture density and the two pure densities (all kg/m³), cm³/mol. */
export function excessMolarVolumeFromDensities(
  moleFraction: number, mixtureDensity: number, ethanolDensity: number, waterDensity: number,
): number {
  requireInRange('moleFraction', moleFraction, 0, 1, '');
  // A mistyped table row may be far off; accept any density that cannot overflow the arithmetic.
  requireInRange('mixtureDensity', mixtureDensity, 1e-3, 1e6, 'kg/m³');
  requireInRange('ethanolDensity', ethanolDensity, 100, 5000, 'kg/m³');
  requireInRange('waterDensity', waterDensity, 100, 5000, 'kg/m³');
  // M [g/mol] / rho [kg/m³] is in L/mol; ×1000 gives cm³/mol.
  const meanMolarMass = moleFraction * ETHANOL_MOLAR_MASS + (1 - moleFraction) * WATER_MOLAR_MASS;
  const ideal = moleFraction * ETHANOL_MOLAR_MASS / ethanolDensity + (1 - moleFraction) * WATER_MOLAR_MASS / waterDensity;
  return 1000 * (meanMolarMass / mixtureDensity - ideal);
}

/** Excess molar volume of an ethanol–water mixture by the OIML R 22 equation, cm³/mol (zero at the pure ends). */
export function excessMolarVolume(massFraction: MassFraction, temperature: Celsius): number {
  const x = moleFractionFromMassFraction(massFraction);
  return excessMolarVolumeFromDensities(
    x, ethanolWaterDensity(massFraction, temperature), pureEthanolDensity(temperature), ethanolWaterDensity(0, temperature),
  );
}

/** Result of mixing known volumes of pure ethanol and water at one temperature. */
export interface MixContraction {
  massFraction: number;
  percentVolume: number;
  finalVolume: number;
  contractionVolume: number;
  contractionPercent: number;
}

/** Volume after mixing given volumes (L, same t) of pure ethanol and water, and the contraction. */
export function mixContraction(ethanolVolume: number, waterVolume: number, temperature: Celsius): MixContraction {
  requirePositive('ethanolVolume', ethanolVolume, 'L');
  requirePositive('waterVolume', waterVolume, 'L');
  const ethanolDensity = pureEthanolDensity(temperature);
  const ethanolMass = ethanolVolume * ethanolDensity;
  const totalMass = ethanolMass + waterVolume * ethanolWaterDensity(0, temperature);
  const massFraction = ethanolMass / totalMass;
  const finalVolume = totalMass / ethanolWaterDensity(massFraction, temperature);
  const separate = ethanolVolume + waterVolume;
  return {
    massFraction,
    percentVolume: (100 * ethanolVolume) / finalVolume,
    finalVolume,
    contractionVolume: separate - finalVolume,
    contractionPercent: (100 * (separate - finalVolume)) / separate,
  };
}
