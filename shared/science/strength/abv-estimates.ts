import { requireInRange, requireNotAbove } from '../units/range-guard';
import type { SpecificGravity } from '../units/unit-types';

/** Checks an OG/FG pair: both in the beer range, FG not above OG. */
export function requireGravityPair(og: SpecificGravity, fg: SpecificGravity): void {
  requireInRange('og', og, 1.0, 1.2, 'SG');
  requireInRange('fg', fg, 0.98, 1.2, 'SG');
  requireNotAbove('fg', fg, 'og', og, 'SG');
}

/** ABV estimate (% vol) by the linear rule (OG − FG) × 131.25; common practice, drifts high for strong beers. */
export function abvLinearEstimate(og: SpecificGravity, fg: SpecificGravity): number {
  requireGravityPair(og, fg);
  return (og - fg) * 131.25;
}

/** ABV estimate (% vol) by the alternative non-linear formula 76.08·(OG − FG)/(1.775 − OG)·FG/0.794; common practice. */
export function abvNonLinearEstimate(og: SpecificGravity, fg: SpecificGravity): number {
  requireGravityPair(og, fg);
  return ((76.08 * (og - fg)) / (1.775 - og)) * (fg / 0.794);
}
