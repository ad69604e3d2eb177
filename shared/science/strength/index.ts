// Public entry of strength: each function with its one-line summary; types and constants follow.
/** Apparent attenuation, %, from original and apparent extract (°P). */
export { apparentAttenuation } from './attenuation';
/** Real attenuation, %, from original and real extract (°P). */
export { realAttenuation } from './attenuation';
/** Real extract (°P) from original and apparent extract by Balling's relation RE = 0.1808·OE + 0.8192·AE. */
export { realExtract } from './balling';
/** Alcohol by mass (% m/m) from original and real extract by Balling's relation. */
export { alcoholByMass } from './balling';
/** ABV estimate (% vol) by the linear rule (OG − FG) × 131.25; common practice, drifts high for strong beers. */
export { abvLinearEstimate } from './abv-estimates';
/** ABV estimate (% vol) by the alternative non-linear formula 76.08·(OG − FG)/(1.775 − OG)·FG/0.794; common practice. */
export { abvNonLinearEstimate } from './abv-estimates';
/** Density-based % vol at 20 °C from OG and FG with every intermediate (OE, AE, RE, ABW, densities). */
export { strengthBreakdown } from './density-abv';
/** Density-based % vol at 20 °C from OG and FG; the headline of strengthBreakdown. */
export { densityBasedAbv } from './density-abv';
/** % vol = ABW × beer density at t ÷ pure-ethanol density at t, restated to 20 °C. */
export { strengthFromBeerDensity } from './measured-density-abv';
export type { StrengthBreakdown } from './density-abv';
export type { MeasuredDensityStrength } from './measured-density-abv';
