import { densityResidual, fitVolumes, FitPoint, robustScale, VolumeFit } from './audit-fit';

/** Thresholds of the robust fit: the table's printing resolution and how far a row must stand out. */
export interface RobustFitThresholds { resolution: number; scaleMultiple: number; resolutionMultiple: number }

const MAX_INTERIOR_LEVERAGE = 0.8;
const MAX_ORDER = 20;
// A MAD scale from ~100 rows is itself uncertain by ~10 %; orders within this factor of the best tie.
const SCALE_SLACK = 1.5;

/** A fit at one order with the rows it keeps, its robust scale and its first (all-rows) fit. */
export interface OrderFit { fit: VolumeFit; active: boolean[]; scale: number; firstFit: VolumeFit }

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
export function fitOrder(points: FitPoint[], order: number, floor: number, options: RobustFitThresholds): OrderFit {
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
export function chooseOrder(points: FitPoint[], floor: number, options: RobustFitThresholds): { order: number; result: OrderFit } {
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
