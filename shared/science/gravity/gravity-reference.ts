import { requireInRange } from '../units/range-guard';
import type { Celsius, SpecificGravity } from '../units/unit-types';
import { waterDensity } from '../water-density/tanaka-water-density';
import { SG_MAX, SG_MIN } from './plato';

/** 60 °F in °C, the US reference temperature. */
export const SIXTY_F_IN_C = (60 - 32) / 1.8;

/**
 * Restates SG t1/t1 as SG t2/t2. The excess density of the solution over water is taken as the
 * same at both temperatures; over a few kelvin its change is far below a hydrometer's resolution.
 */
export function restateSpecificGravity(sg: SpecificGravity, from: Celsius, to: Celsius): SpecificGravity {
  requireInRange('sg', sg, SG_MIN - 0.01, SG_MAX + 0.01, 'SG');
  const fromWater = waterDensity(from);
  const toWater = waterDensity(to);
  return 1 + ((sg - 1) * fromWater) / toWater;
}

/** SG 60/60 °F from SG 20/20 °C. */
export function sg6060FromSg2020(sg: SpecificGravity): SpecificGravity {
  return restateSpecificGravity(sg, 20, SIXTY_F_IN_C);
}

/** SG 20/20 °C from SG 60/60 °F. */
export function sg2020FromSg6060(sg: SpecificGravity): SpecificGravity {
  return restateSpecificGravity(sg, SIXTY_F_IN_C, 20);
}

/**
 * Hydrometer reading at sample temperature t corrected to the instrument's calibration
 * temperature: the sample is taken to expand like water (density of water by Tanaka et al. 2001).
 */
export function hydrometerTemperatureCorrection(reading: SpecificGravity, sampleTemperature: Celsius, calibrationTemperature: Celsius = 20): SpecificGravity {
  requireInRange('reading', reading, 0.98, 1.2, 'SG');
  return (reading * waterDensity(calibrationTemperature)) / waterDensity(sampleTemperature);
}
