import { requireInRange, requirePositive } from '../units/range-guard';
import { ScienceRangeError } from '../units/science-range-error';
import { excessMolarVolumeFromDensities } from '../ethanol-water/excess-volume';
import { moleFractionFromMassFraction } from '../ethanol-water/concentration';
import { ETHANOL_MOLAR_MASS, WATER_MOLAR_MASS } from '../ethanol-water/molar-masses';
import { ethanolWaterDensity } from '../ethanol-water/oiml-density';
import { densityResidual, FitPoint, fittedVolume, VolumeFit } from './audit-fit';
import { chooseOrder } from './robust-order-fit';

/** One row of a reference table: % mass of ethanol and the density at the table's temperature. */
export interface DensityTableRow { massPercent: number; density: number }

/** A row as audited: its mole fraction, volumes and, when flagged, the bump and the density that removes it. */
export interface AuditedRow extends DensityTableRow {
  moleFraction: number;
  ethanolMolarVolume: number;
  waterMolarVolume: number;
  excessMolarVolume: number;
  densityResidual: number;
  flagged: boolean;
  bumpCm3PerMol: number;
  suggestedDensity: number;
}

/** The outcome of an audit: every row, the flagged ones, the chosen order and the robust scale. */
export interface TableAudit {
  rows: AuditedRow[];
  flagged: AuditedRow[];
  order: number;
  robustScale: number;
  fit: VolumeFit;
}

/**
 * Options: the table's printing resolution (kg/m³); how many robust scales, and how many
 * resolutions, a row must stand out by; and the composition the expansion runs in. The default,
 * mass fraction, spreads a table printed at even % mass steps evenly over the expansion's range;
 * in mole fraction the ethanol-rich rows crowd into the last fifth, where a high-order curve can
 * hide a bad row (expressed per gram, the excess volume is the molar one divided by the mean molar mass).
 */
export interface AuditOptions {
  resolution?: number;
  scaleMultiple?: number;
  resolutionMultiple?: number;
  composition?: 'mass' | 'mole';
}

function meanMolarMass(x: number): number {
  return x * ETHANOL_MOLAR_MASS + (1 - x) * WATER_MOLAR_MASS;
}

/** Prepares table rows for fitting in the chosen composition. */
function toPoints(rows: readonly DensityTableRow[], composition: 'mass' | 'mole'): FitPoint[] {
  return rows.map(({ massPercent, density }, i) => {
    requireInRange(`rows[${i}].massPercent`, massPercent, 0, 100, '% mass');
    requirePositive(`rows[${i}].density`, density, 'kg/m³', 1e5);
    const x = moleFractionFromMassFraction(massPercent / 100);
    const amount = composition === 'mole' ? meanMolarMass(x) : 1;
    return { z: composition === 'mole' ? x : massPercent / 100, amount, density, volume: (1000 * amount) / density };
  });
}

/**
 * Audits a (% mass, density) table at one temperature: excess molar volume per row, a Redlich–Kister
 * fit with its order chosen from the data, and the rows that stand out as bumps.
 */
export function auditDensityTable(table: readonly DensityTableRow[], temperature: number, options: AuditOptions = {}): TableAudit {
  requireInRange('temperature', temperature, 0, 40, '°C');
  if (table.length < 12) throw new ScienceRangeError('rows', table.length, 12, Infinity, 'rows', 'below-range', `the table has ${table.length} rows; an audit needs at least 12`);
  const opts: Required<AuditOptions> = { resolution: 0.01, scaleMultiple: 8, resolutionMultiple: 2.5, composition: 'mass', ...options };
  requireInRange('resolution', opts.resolution, 1e-6, 10, 'kg/m³');
  const points = toPoints(table, opts.composition);
  const { order, result } = chooseOrder(points, opts.resolution / Math.sqrt(12), opts);
  const pureEthanol = table.find((r) => r.massPercent === 100)?.density ?? ethanolWaterDensity(1, temperature);
  const pureWater = table.find((r) => r.massPercent === 0)?.density ?? ethanolWaterDensity(0, temperature);
  const rows = table.map((row, i): AuditedRow => {
    const p = points[i];
    const x = moleFractionFromMassFraction(row.massPercent / 100);
    const fitted = fittedVolume(result.fit, p.z);
    // The bump is reported per mole whatever the fitting basis: per-unit volumes scale by M/amount.
    const toMolar = meanMolarMass(x) / p.amount;
    return {
      ...row,
      moleFraction: x,
      ethanolMolarVolume: (1000 * ETHANOL_MOLAR_MASS) / pureEthanol,
      waterMolarVolume: (1000 * WATER_MOLAR_MASS) / pureWater,
      excessMolarVolume: excessMolarVolumeFromDensities(x, row.density, pureEthanol, pureWater),
      densityResidual: densityResidual(result.fit, p),
      flagged: !result.active[i],
      bumpCm3PerMol: (p.volume - fitted) * toMolar,
      suggestedDensity: (1000 * p.amount) / fitted,
    };
  });
  return { rows, flagged: rows.filter((r) => r.flagged), order, robustScale: result.scale, fit: result.fit };
}
