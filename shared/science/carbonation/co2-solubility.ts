import { requireInRange } from '../units/range-guard';
import type { Celsius } from '../units/unit-types';

// Henry's-law solubility of CO2 in water: kH = 0.034 mol/(L·atm) at 25 °C with
// d ln kH / d(1/T) = 2400 K (Sander's compilation of Henry's law constants, 2015).
const KH_25 = 0.034;
const VAN_T_HOFF = 2400;
// One "volume" of CO2 is one litre of gas at 0 °C and 1 atm per litre of beer: 44.01 g/mol ÷ 1.977 g/L.
const STP_LITRES_PER_MOL = 44.01 / 1.977;
const BAR_PER_ATM = 1.01325;

/** Volumes of CO2 dissolved per atm of CO2 partial pressure at t (Henry's law). */
export function co2VolumesPerAtm(temperature: Celsius): number {
  requireInRange('temperature', temperature, -2, 40, '°C');
  const kelvin = temperature + 273.15;
  return KH_25 * Math.exp(VAN_T_HOFF * (1 / kelvin - 1 / 298.15)) * STP_LITRES_PER_MOL;
}

/** Gauge pressure (bar) that holds a given CO2 content at t, with 1.01325 bar of atmosphere outside. */
export function gaugePressureForVolumes(volumes: number, temperature: Celsius): number {
  requireInRange('volumes', volumes, 0, 10, 'vol');
  return (volumes / co2VolumesPerAtm(temperature)) * BAR_PER_ATM - BAR_PER_ATM;
}

/** CO2 content (volumes) held by a gauge pressure (bar) at t. */
export function volumesAtGaugePressure(gaugeBar: number, temperature: Celsius): number {
  requireInRange('gaugeBar', gaugeBar, -1.01325, 20, 'bar');
  return ((gaugeBar + BAR_PER_ATM) / BAR_PER_ATM) * co2VolumesPerAtm(temperature);
}

/** Converts bar to psi. */
export function barToPsi(bar: number): number {
  requireInRange('bar', bar, -BAR_PER_ATM, 1e4, 'bar');
  return bar * 14.503773773;
}
