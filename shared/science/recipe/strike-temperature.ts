import { requireInRange } from '../units/range-guard';
import type { Celsius } from '../units/unit-types';

/** Heat capacity of dry malt relative to water; common practice 0.4. */
export const GRAIN_HEAT_CAPACITY_RATIO = 0.4;

/** Specific heat of water near mash temperatures, kJ/(kg·K) (1 L of water taken as 1 kg). */
export const WATER_SPECIFIC_HEAT_KJ_PER_KG_K = 4.18;

/** A mash tun that takes heat too: its heat capacity and the grain it holds. */
export interface MashTun {
  heatCapacityKjPerK: number;
  grainKilograms: number;
}

/**
 * Strike-water temperature for a target mash temperature by the heat balance
 * m_w c_w (T_strike − T_mash) = (m_g c_g + C_tun)(T_mash − T_grain), with m_w = r · m_g.
 * Without a tun this is T_strike = T_mash + (c_grain / r)(T_mash − T_grain), r in L/kg; a tun
 * is taken to start at the grain's temperature (an unheated tun in the same room).
 */
export function strikeWaterTemperature(
  targetMash: Celsius, grainTemperature: Celsius, ratioLitresPerKg: number, grainHeatCapacity = GRAIN_HEAT_CAPACITY_RATIO, tun?: MashTun,
): Celsius {
  requireInRange('targetMash', targetMash, 30, 80, '°C');
  requireInRange('grainTemperature', grainTemperature, -10, 50, '°C');
  requireInRange('ratioLitresPerKg', ratioLitresPerKg, 1, 10, 'L/kg');
  requireInRange('grainHeatCapacity', grainHeatCapacity, 0.2, 0.6, '');
  const tunPerKgGrain = tun ? tunHeatPerKgGrain(tun) : 0;
  return targetMash + ((grainHeatCapacity + tunPerKgGrain) / ratioLitresPerKg) * (targetMash - grainTemperature);
}

/** The tun's heat capacity per kg of grain, in units of water's specific heat. */
function tunHeatPerKgGrain(tun: MashTun): number {
  requireInRange('tun.heatCapacityKjPerK', tun.heatCapacityKjPerK, 0, 100, 'kJ/K');
  requireInRange('tun.grainKilograms', tun.grainKilograms, 0.1, 2000, 'kg');
  return tun.heatCapacityKjPerK / WATER_SPECIFIC_HEAT_KJ_PER_KG_K / tun.grainKilograms;
}
