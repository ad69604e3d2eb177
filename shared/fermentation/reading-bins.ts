import type { GravityPoint } from './fermentation-forecast';

/**
 * Averages readings into at most `bins` equal stretches of time, so a logger's ten thousand rows fit
 * as fast as a few hundred: the mean of a stretch keeps the curve's shape, and the fit's band still
 * comes from the scatter of the means about it.
 */
export function binReadings(readings: readonly GravityPoint[], bins: number): GravityPoint[] {
  if (readings.length <= bins) return [...readings];
  const first = readings[0].time;
  const span = readings[readings.length - 1].time - first || 1;
  const sums = Array.from({ length: bins }, () => ({ time: 0, gravity: 0, n: 0 }));
  for (const r of readings) {
    const i = Math.min(bins - 1, Math.floor(((r.time - first) / span) * bins));
    sums[i].time += r.time;
    sums[i].gravity += r.gravity;
    sums[i].n++;
  }
  return sums.filter((s) => s.n > 0).map((s) => ({ time: s.time / s.n, gravity: s.gravity / s.n }));
}
