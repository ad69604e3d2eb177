// Public entry of recipe: each function with its one-line summary; types and constants follow.
/** OG (SG 20/20 °C) from a metric grain bill: masses, extract yields, efficiency and volume. */
export { originalGravityMetric } from './original-gravity';
/** OG from a US grain bill: points = Σ lb × PPG × efficiency ÷ gallons; OG = 1 + points/1000 (common practice). */
export { originalGravityUs } from './original-gravity';
/** Final gravity from OG and the yeast's apparent attenuation (%). */
export { finalGravityFromAttenuation } from './original-gravity';
/** Strike, sparge, pre-boil and total water from brewhouse settings (batch-sparge style bookkeeping). */
export { brewhouseVolumes } from './water-volumes';
/** Strike-water temperature for a target mash temperature by the usual heat balance (ratio in L/kg). */
export { strikeWaterTemperature } from './strike-temperature';
/** Tinseth's utilisation: bigness factor 1.65 × 0.000125^(G − 1) times boil-time factor (1 − e^(−0.04 t))/4.15. */
export { tinsethUtilisation } from './bitterness';
/** IBU of one addition by Tinseth: utilisation × mg/L of alpha acids added. */
export { tinsethIbu } from './bitterness';
/** Total IBU of several additions by Tinseth. */
export { totalTinsethIbu } from './bitterness';
/** BU:GU, the ratio of IBU to the OG's gravity points. */
export { bitternessRatio } from './bitterness';
/** Speed of alpha-acid isomerisation at a temperature relative to the boil (100 °C), by Malowicki's Arrhenius fit. */
export { isomerisationRateRelativeToBoil } from './hop-stand';
/** IBU of a whirlpool or hop-stand addition: Tinseth at the stand's minutes, scaled by the relative isomerisation rate. */
export { hopStandIbu } from './hop-stand';
/** Mash efficiency implied by a brewhouse efficiency into the fermenter and the wort left in the kettle. */
export { mashEfficiencyFromBrewhouse } from './efficiency';
/** Beer colour by Morey's equation from malts and the batch volume in US gallons. */
export { moreyColour } from './colour';
/** Beer colour by Morey with the batch volume in litres (malt masses in kilograms or pounds). */
export { moreyColourMetric } from './colour';
/** Malt colour in °L from EBC. */
export { lovibondFromEbc } from './colour';
/** Malt colour in EBC from °L. */
export { ebcFromLovibond } from './colour';
/** Yeast cells to pitch, in billions: rate × mL × °P (rate in million cells/mL/°P). */
export { yeastCellsToPitch } from './yeast-pitch';
export type { MetricFermentable, UsFermentable } from './original-gravity';
export type { VolumePlanSettings, VolumePlan } from './water-volumes';
export { GRAIN_HEAT_CAPACITY_RATIO, WATER_SPECIFIC_HEAT_KJ_PER_KG_K, type MashTun } from './strike-temperature';
export type { HopAddition } from './bitterness';
export type { ColourMalt, BeerColour } from './colour';
export { PITCH_RATES } from './yeast-pitch';
export type { PitchStyle } from './yeast-pitch';
