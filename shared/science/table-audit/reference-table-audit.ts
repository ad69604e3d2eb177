import { requireInRange, requirePositive } from '../units/range-guard';
import { ScienceRangeError } from '../units/science-range-error';
import { excessMolarVolumeFromDensities } from '../ethanol-water/excess-volume';
import { moleFractionFromMassFraction } from '../ethanol-water/concentration';
import { ETHANOL_MOLAR_MASS, WATER_MOLAR_MASS } from '../ethanol-water/molar-masses';
import { ethanolWaterDensity } from '../ethanol-water/oiml-density';
import { densityResidual, fitVolumes, FitPoint, fittedVolume, robustScale, VolumeFit } from './audit-fit';

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

const MAX_INTERIOR_LEVERAGE = 0.8;
const MAX_ORDER = 20;
// A MAD scale from ~100 rows is itself uncertain by ~10 %; orders within this factor of the best tie.
const SCALE_SLACK = 1.5;

interface OrderFit { fit: VolumeFit; active: boolean[]; scale: number; firstFit: VolumeFit }

function meanMolarMass(x: number): number {
  return x * ETHANOL_MOLAR_MASS + (1 - x) * WATER_MOLAR_MASS;
}

export function toPoints(rows: readonly DensityTableRow[], composition: 'mass' | 'mole'): FitPoint[] {
  return rows.map(({ massPercent, density }, i) => {
    requireInRange(`rows[${i}].massPercent`, massPercent, 0, 100, '% mass');
    requirePositive(`rows[${i}].density`, density, 'kg/m³', 1e5);
    const x = moleFractionFromMassFraction(massPercent / 100);
    const amount = composition === 'mole' ? meanMolarMass(x) : 1;
    return { z: composition === 'mole' ? x : massPercent / 100, amount, density, volume: (1000 * amount) / density };
  });
}

interface Judgement { worst: number; worstScore: number; scale: number; residuals: number[] }

/**
 * Scores each point by its studentised residual r/(s·√(1−h)), counting only points whose deleted
 * residual r/(1−h) is above the table's printing noise. Near the pure ends a high-order fit bends
 * towards a bad point (h near 1) and would hide it from the plain residual. Left-out points are
 * scored as predictions, r/(s·√(1+h)).
 */
function judge(points: FitPoint[], active: boolean[], fit: VolumeFit, floor: number, absolute: number, wantActive: boolean): Judgement {
  const residuals = points.map((p) => densityResidual(fit, p));
  const scale = Math.max(robustScale(residuals.filter((_, i) => active[i])), floor);
  let worst = -1;
  let worstScore = wantActive ? 0 : Infinity;
  residuals.forEach((r, i) => {
    if (active[i] !== wantActive) return;
    const room = wantActive ? Math.max(1 - fit.leverages[i], 1e-6) : 1 + fit.leverages[i];
    const visible = wantActive ? Math.abs(r) / room > absolute : Math.abs(r) > absolute * Math.sqrt(room);
    const score = visible ? Math.abs(r) / (scale * Math.sqrt(room)) : 0;
    if (wantActive ? score > worstScore : score < worstScore) { worst = i; worstScore = score; }
  });
  return { worst, worstScore, scale, residuals };
}

/**
 * Fits one order, taking out the worst point one at a time while it stands out, then putting back
 * one at a time any left-out point the final fit predicts well (a gross error can drag the first
 * fits enough to make a sound neighbour look bad).
 */
export function fitOrder(points: FitPoint[], order: number, floor: number, options: Required<AuditOptions>): OrderFit {
  const active = points.map(() => true);
  const absolute = options.resolutionMultiple * options.resolution;
  const maxRemovals = Math.floor(points.length / 5);
  let fit = fitVolumes(points, active, order);
  const firstFit = fit;
  for (let step = 0; step < 3 * maxRemovals; step++) {
    const out = judge(points, active, fit, floor, absolute, true);
    const removed = active.filter((a) => !a).length;
    if (out.worst >= 0 && out.worstScore > options.scaleMultiple && removed < maxRemovals) {
      active[out.worst] = false;
    } else {
      const back = judge(points, active, fit, floor, absolute, false);
      if (back.worst < 0 || back.worstScore > options.scaleMultiple) return { fit, active, scale: out.scale, firstFit };
      active[back.worst] = true;
    }
    fit = fitVolumes(points, active, order);
  }
  return { fit, active, scale: judge(points, active, fit, floor, absolute, true).scale, firstFit };
}

/** Highest leverage under a fit among rows other than the two nearest each pure end. */
function interiorLeverage(points: FitPoint[], fit: VolumeFit): number {
  const byX = points.map((p, i) => [p.z, fit.leverages[i]]).sort((a, b) => a[0] - b[0]);
  return Math.max(...byX.slice(2, -2).map((pair) => pair[1]));
}

/**
 * Orders are tried upwards while every interior row keeps a leverage of at most 0.8: beyond it
 * the curve can bend onto a single row and hide its error. Among those, the ones whose robust
 * scale is within SCALE_SLACK of the best (higher orders only chase rounding), and of these the one that
 * leaves out the fewest rows (too low an order misfits a stretch of sound rows), then the closest fit.
 */
export function chooseOrder(points: FitPoint[], floor: number, options: Required<AuditOptions>): { order: number; result: OrderFit } {
  const fits: OrderFit[] = [];
  for (let order = 0; order <= Math.min(MAX_ORDER, points.length - 6); order++) {
    const candidate = fitOrder(points, order, floor, options);
    if (order > 0 && interiorLeverage(points, candidate.firstFit) > MAX_INTERIOR_LEVERAGE) break;
    fits.push(candidate);
  }
  const best = Math.min(...fits.map((f) => f.scale));
  const removed = fits.map((f) => f.active.filter((a) => !a).length);
  let order = -1;
  fits.forEach((f, n) => {
    if (f.scale > SCALE_SLACK * best) return;
    if (order < 0 || removed[n] < removed[order] || (removed[n] === removed[order] && f.scale < fits[order].scale)) order = n;
  });
  return { order, result: fits[order] };
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
