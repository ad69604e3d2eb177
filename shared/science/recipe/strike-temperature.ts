import { requireInRange } from '../units/range-guard';
import type { Celsius } from '../units/unit-types';

/** Heat capacity of dry malt relative to water; common practice 0.4. */
export const GRAIN_HEAT_CAPACITY_RATIO = 0.4;

/**
 * Strike-water temperature for a target mash temperature by the heat balance
 * T_strike = T_mash + (c_grain / r)(T_mash − T_grain), r in L/kg (1 L of water taken as 1 kg).
 */
export function strikeWaterTemperature(
  targetMash: Celsius, grainTemperature: Celsius, ratioLitresPerKg: number, grainHeatCapacity = GRAIN_HEAT_CAPACITY_RATIO,
): Celsius {
  requireInRange('targetMash', targetMash, 30, 80, '°C');
  requireInRange('grainTemperature', grainTemperature, -10, 50, '°C');
  requireInRange('ratioLitresPerKg', ratioLitresPerKg, 1, 10, 'L/kg');
  requireInRange('grainHeatCapacity', grainHeatCapacity, 0.2, 0.6, '');
  return targetMash + (grainHeatCapacity / ratioLitresPerKg) * (targetMash - grainTemperature);
}
