import { requireInRange } from '../units/range-guard';
import type { Litres, SpecificGravity } from '../units/unit-types';
import { HopAddition, tinsethIbu } from './bitterness';

// Malowicki's Arrhenius fit of alpha-acid isomerisation in wort, k = 7.9·10^11 · e^(−11858 / T) per minute
// with T in kelvin (M. G. Malowicki, MS thesis, Oregon State University, 2005; constants from memory).
const ACTIVATION_TEMPERATURE_K = 11858;
const BOIL_K = 373.15;

/** Speed of alpha-acid isomerisation at a temperature relative to the boil (100 °C), by Malowicki's Arrhenius fit. */
export function isomerisationRateRelativeToBoil(temperatureC: number): number {
  requireInRange('temperatureC', temperatureC, 0, 100, '°C');
  const kelvin = temperatureC + 273.15;
  return Math.exp(-ACTIVATION_TEMPERATURE_K * (1 / kelvin - 1 / BOIL_K));
}

/**
 * IBU of a whirlpool or hop-stand addition: Tinseth's utilisation for the stand's minutes, scaled by the
 * isomerisation rate at the stand temperature relative to the boil. Assumes the stand holds that
 * temperature throughout and that Tinseth's time curve holds below the boil at the slower rate.
 */
export function hopStandIbu(addition: HopAddition, boilGravity: SpecificGravity, litres: Litres, standTemperatureC: number): number {
  const factor = isomerisationRateRelativeToBoil(standTemperatureC);
  return tinsethIbu(addition, boilGravity, litres) * factor;
}
