import { requireInRange } from '../units/range-guard';
import type { Celsius } from '../units/unit-types';
import { barToPsi, gaugePressureForVolumes } from './co2-solubility';

/** Pressure at which the relief valves of common soda-style kegs are set to open; common practice about 3.5 bar. */
export const COMMON_KEG_RELIEF_BAR = 3.5;

/** Regulator setting for a CO2 target at a serving temperature, with flags the app warns on. */
export interface KegSetting {
  gaugeBar: number;
  gaugePsi: number;
  aboveCommonKegRelief: boolean;
}

/** Gauge pressure to hold a target CO2 content (volumes) at the serving temperature (Henry's law). */
export function kegPressure(targetVolumes: number, servingTemperature: Celsius): KegSetting {
  requireInRange('targetVolumes', targetVolumes, 0.5, 6, 'vol');
  requireInRange('servingTemperature', servingTemperature, -2, 30, '°C');
  const gaugeBar = gaugePressureForVolumes(targetVolumes, servingTemperature);
  return { gaugeBar, gaugePsi: barToPsi(gaugeBar), aboveCommonKegRelief: gaugeBar > COMMON_KEG_RELIEF_BAR };
}
