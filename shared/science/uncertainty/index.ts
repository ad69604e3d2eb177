// Public entry of uncertainty: each function with its one-line summary; types and constants follow.
/** Standard uncertainty of a reading limited by its resolution: rectangular, half-width res/2 → res/√12 (GUM 4.3.7). */
export { resolutionUncertainty } from './measurement-uncertainty';
/** Whether a declared value is within ±tolerance of a measured one, given its expanded uncertainty. */
export { toleranceVerdict } from './measurement-uncertainty';
/** Strength from hydrometer readings, temperature-corrected, with propagated resolution uncertainty. */
export { hydrometerStrengthUncertainty } from './strength-uncertainty';
/** Strength from original and current refractometer °Bx, with propagated resolution uncertainty. */
export { refractometerStrengthUncertainty } from './strength-uncertainty';
/** Beer % vol at 20 °C from a distillate analysis, with the uncertainty propagated from instrument resolution. */
export { distillateStrengthUncertainty } from './distillate-uncertainty';
export type { DistillateResolutions } from './distillate-uncertainty';
export type { UncertainValue, ToleranceVerdict } from './measurement-uncertainty';
export type { HydrometerStrengthInput, StrengthWithUncertainty } from './strength-uncertainty';
