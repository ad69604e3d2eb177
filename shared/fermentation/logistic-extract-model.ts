/**
 * Apparent extract over time as a four-parameter logistic curve, the model of Speers, Rogers and
 * Smith, "Non-linear modelling of industrial brewing fermentations", J. Inst. Brew. 109 (2003)
 * 229–235 (citation from memory):
 *
 *   P(t) = Pe + (Pi − Pe) / (1 + exp(B·(t − M)))
 *
 * Pi is the upper asymptote (°P, the wort before it ferments), Pe the lower asymptote (°P, the
 * apparent extract the beer ends at), B the rate (per day) and M the day of the steepest fall.
 */
export interface LogisticParameters {
  initialExtract: number;
  finalExtract: number;
  rate: number;
  midpointDay: number;
}

/** Parameter order used by the fit: [Pi, Pe, B, M]. */
export type LogisticVector = readonly [number, number, number, number];

export function toVector(p: LogisticParameters): LogisticVector {
  return [p.initialExtract, p.finalExtract, p.rate, p.midpointDay];
}

export function fromVector(v: readonly number[]): LogisticParameters {
  return { initialExtract: v[0], finalExtract: v[1], rate: v[2], midpointDay: v[3] };
}

// exp() of more than ~700 overflows; past ±50 the curve sits on its asymptote to 1e-21 anyway.
function exponent(b: number, day: number, m: number): number {
  return Math.exp(Math.max(-50, Math.min(50, b * (day - m))));
}

/** Apparent extract (°P) at a day. */
export function logisticExtract(day: number, v: readonly number[]): number {
  const [pi, pe, b, m] = v;
  return pe + (pi - pe) / (1 + exponent(b, day, m));
}

/** Partial derivatives of the extract at a day with respect to [Pi, Pe, B, M]. */
export function logisticGradient(day: number, v: readonly number[]): number[] {
  const [pi, pe, b, m] = v;
  const e = exponent(b, day, m);
  const s = 1 / (1 + e);
  const common = (pi - pe) * e * s * s;
  return [s, 1 - s, -common * (day - m), common * b];
}

/** The day the curve comes within `margin` °P of its final extract; before the first day when it starts there. */
export function dayWithinMargin(v: readonly number[], margin: number): number {
  const [pi, pe, b, m] = v;
  const ratio = (pi - pe) / margin - 1;
  if (ratio <= 0) return -Infinity;
  return m + Math.log(ratio) / b;
}
