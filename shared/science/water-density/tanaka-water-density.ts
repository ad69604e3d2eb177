import { requireInRange } from '../units/range-guard';
import type { Celsius, KgPerCubicMetre } from '../units/unit-types';

// Tanaka et al., Metrologia 38 (2001) 301–309, the CIPM equation for SMOW, air-free, 101.325 kPa.
const A1 = -3.983035;
const A2 = 301.797;
const A3 = 522528.9;
const A4 = 69.34881;
const A5 = 999.97495;

/** Range of the Tanaka fit, °C. */
export const WATER_T_MIN = 0;
export const WATER_T_MAX = 40;

/** Density of pure water at t by the CIPM equation (Tanaka et al. 2001), kg/m³. */
export function waterDensity(temperature: Celsius): KgPerCubicMetre {
  requireInRange('temperature', temperature, WATER_T_MIN, WATER_T_MAX, '°C');
  const t = temperature;
  return A5 * (1 - ((t + A1) * (t + A1) * (t + A2)) / (A3 * (t + A4)));
}
