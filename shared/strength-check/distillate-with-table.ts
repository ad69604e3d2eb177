import { analyseDistillate, DistillateAnalysis, ethanolWaterDensity, massFractionFromDensity, percentVolumeFromMassFraction, ScienceRangeError, UncertainValue } from '../science';
import { propagate, resolutionUncertainty } from '../science/uncertainty/measurement-uncertainty';

/** A reference table the lab reads: rows of (% mass, density) at one temperature. */
export interface LabTable { temperature: number; rows: readonly { massPercent: number; density: number }[] }

/** How far from the table's temperature a distillate may be read, °C. */
export const TABLE_TEMPERATURE_MATCH = 0.05;

/**
 * Mass fraction from a density by a reference table: the table's departure from the OIML R 22
 * equation is interpolated linearly between rows and added to the equation, so the curvature comes
 * from the equation and the table's own values are honoured at its rows.
 */
export function massFractionFromTable(table: LabTable, density: number): number {
  const rows = [...table.rows].sort((a, b) => a.massPercent - b.massPercent);
  const offset = (p: number) => {
    const x = 100 * p;
    const i = Math.max(0, Math.min(rows.length - 2, rows.findIndex((r) => r.massPercent >= x) - 1));
    const [a, b] = [rows[i], rows[i + 1]];
    const da = a.density - ethanolWaterDensity(a.massPercent / 100, table.temperature);
    const db = b.density - ethanolWaterDensity(b.massPercent / 100, table.temperature);
    return da + ((db - da) * (x - a.massPercent)) / (b.massPercent - a.massPercent);
  };
  let p = massFractionFromDensity(density, table.temperature);
  for (let k = 0; k < 8; k++) p = massFractionFromDensity(density - offset(p), table.temperature);
  return p;
}

/** A distillate analysis read with a reference table instead of the equation (same steps as analyseDistillate). */
export function analyseDistillateWithTable(table: LabTable, sampleVolume: number, madeUpVolume: number, density: number, temperature: number): DistillateAnalysis {
  if (Math.abs(temperature - table.temperature) > TABLE_TEMPERATURE_MATCH) {
    throw new ScienceRangeError('temperature', temperature, table.temperature - TABLE_TEMPERATURE_MATCH, table.temperature + TABLE_TEMPERATURE_MATCH, '°C', 'inconsistent',
      `the chosen table is at ${table.temperature} °C; read the distillate at that temperature or use the built-in equation`);
  }
  const reference = analyseDistillate(sampleVolume, madeUpVolume, density, temperature);
  const distillateMassFraction = massFractionFromTable(table, density);
  const distillatePercentVolume20 = percentVolumeFromMassFraction(distillateMassFraction, 20);
  const beerPercentVolume20 = (distillatePercentVolume20 * madeUpVolume) / sampleVolume;
  return { ...reference, distillateMassFraction, distillatePercentVolume20, beerPercentVolume20, aboveBeerRange: beerPercentVolume20 > 20 };
}

/** The beer's % vol at 20 °C from a table, with the uncertainty from the density meter's and the flasks' resolution. */
export function distillateWithTableUncertainty(table: LabTable, sampleVolume: number, madeUpVolume: number, density: number, temperature: number, densityResolution: number, volumeResolution = 0.0001): UncertainValue {
  const uV = resolutionUncertainty(volumeResolution);
  return propagate((v) => analyseDistillateWithTable(table, v[0], v[1], v[2], temperature).beerPercentVolume20, [sampleVolume, madeUpVolume, density], [uV, uV, resolutionUncertainty(densityResolution)]);
}
