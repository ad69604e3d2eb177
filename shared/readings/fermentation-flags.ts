import { Instrument } from './gravity-reading';
import { INSTRUMENT_RESOLUTION_SG } from './instrument-resolution';

/** A corrected reading as the flags need it. */
export interface GravityPoint {
  /** Epoch milliseconds. */
  at: number;
  sg: number;
  instrument: Instrument;
}

/** How long gravity must hold still before fermentation counts as over (common practice: two days). */
export const STABLE_HOURS = 48;

/**
 * How far short of the yeast's expected apparent attenuation a stable gravity must stay to count
 * as stuck, in percentage points (common practice: yeast makers quote ranges about ±3 points, so
 * 10 points below the middle is clearly outside).
 */
export const STUCK_SHORTFALL_POINTS = 10;

/**
 * True when the log covers at least 48 h back from its latest reading and every reading in that
 * span lies within the coarsest resolution of the instruments that took them. Readings must be
 * sorted by time.
 */
export function isGravityStable(points: readonly GravityPoint[]): boolean {
  if (points.length < 2) return false;
  const latest = points[points.length - 1];
  const from = latest.at - STABLE_HOURS * 3600_000;
  let start = -1;
  for (let i = points.length - 1; i >= 0; i--) {
    if (points[i].at <= from) {
      start = i;
      break;
    }
  }
  if (start < 0) return false;
  let min = Infinity;
  let max = -Infinity;
  let resolution = 0;
  for (let i = start; i < points.length; i++) {
    min = Math.min(min, points[i].sg);
    max = Math.max(max, points[i].sg);
    resolution = Math.max(resolution, INSTRUMENT_RESOLUTION_SG[points[i].instrument]);
  }
  // A hair of slack so a difference of exactly one graduation, stored in decimal, still counts.
  return max - min <= resolution + 1e-9;
}

/** Finished and stuck flags from the log, the attenuation reached and the yeast's expected one. */
export function fermentationFlags(
  points: readonly GravityPoint[],
  apparentAttenuationPercent: number | null,
  expectedAttenuationPercent: number | null,
): { finished: boolean; stuck: boolean } {
  if (!isGravityStable(points)) return { finished: false, stuck: false };
  const stuck = apparentAttenuationPercent !== null && expectedAttenuationPercent !== null
    && apparentAttenuationPercent < expectedAttenuationPercent - STUCK_SHORTFALL_POINTS;
  return { finished: !stuck, stuck };
}
