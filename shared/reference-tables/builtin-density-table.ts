import { ethanolWaterDensity, percentVolumeFromMassFraction } from '../science';

/** One line of the built-in table: a composition and its density at the chosen temperature. */
export interface BuiltinTableRow { massPercent: number; density: number; percentVolume20: number; percentVolumeAtT: number }

/** The OIML R 22 equation printed as a table at t (0–40 °C), every `step` % mass. */
export function builtinDensityTable(temperature: number, step = 5): BuiltinTableRow[] {
  const rows: BuiltinTableRow[] = [];
  for (let i = 0; i * step <= 100 + 1e-9; i++) {
    const p = Math.min(1, (i * step) / 100);
    rows.push({
      massPercent: 100 * p,
      density: ethanolWaterDensity(p, temperature),
      percentVolume20: percentVolumeFromMassFraction(p, 20),
      percentVolumeAtT: percentVolumeFromMassFraction(p, temperature),
    });
  }
  return rows;
}
