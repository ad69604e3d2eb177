// Public entry of carbonation: each function with its one-line summary; types and constants follow.
/** Volumes of CO2 dissolved per atm of CO2 partial pressure at t (Henry's law). */
export { co2VolumesPerAtm } from './co2-solubility';
/** Gauge pressure (bar) that holds a given CO2 content at t, with 1.01325 bar of atmosphere outside. */
export { gaugePressureForVolumes } from './co2-solubility';
/** CO2 content (volumes) held by a gauge pressure (bar) at t. */
export { volumesAtGaugePressure } from './co2-solubility';
/** Converts bar to psi. */
export { barToPsi } from './co2-solubility';
/** CO2 left in beer (volumes) after fermentation, from its highest temperature since; common-practice fit. */
export { residualCo2 } from './priming';
/** Priming sugar for a target CO2 content (volumes), and the gauge pressure at the warm storage temperature. */
export { primingSugar } from './priming';
/** Gauge pressure to hold a target CO2 content (volumes) at the serving temperature (Henry's law). */
export { kegPressure } from './keg-pressure';
export { PRIMING_SUGARS, COMMON_BOTTLE_LIMIT_BAR } from './priming';
export type { PrimingSugar, PrimingPlan } from './priming';
export { COMMON_KEG_RELIEF_BAR } from './keg-pressure';
export type { KegSetting } from './keg-pressure';
