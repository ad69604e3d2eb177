// Public entry of ethanol-water: each function with its one-line summary; types and constants follow.
/** Density of an ethanol–water mixture from mass fraction and temperature (OIML R 22), kg/m³. */
export { ethanolWaterDensity } from './oiml-density';
/** Density of pure ethanol at t by the OIML R 22 equation at p = 1, kg/m³. */
export { pureEthanolDensity } from './oiml-density';
/** Density of pure water at t by the OIML R 22 equation at p = 0, kg/m³. */
export { oimlWaterDensity } from './oiml-density';
/** Inverse of the OIML R 22 equation: mass fraction from density and temperature, to 1e-10. */
export { massFractionFromDensity } from './mass-fraction-solver';
/** Mass fraction whose ethanol mass per mixture volume, p·rho, equals the target (kg/m³); the inverse behind % vol and g/L. */
export { massFractionFromEthanolConcentration } from './mass-fraction-solver';
/** % vol at t (ethanol volume at t over mixture volume at t, after mixing) from mass fraction. */
export { percentVolumeFromMassFraction } from './concentration';
/** Mass fraction from % vol at t, the inverse of percentVolumeFromMassFraction. */
export { massFractionFromPercentVolume } from './concentration';
/** Ethanol concentration in g/L (mass of ethanol per litre of mixture at t) from mass fraction. */
export { ethanolGramsPerLitre } from './concentration';
/** Mole fraction of ethanol from mass fraction. */
export { moleFractionFromMassFraction } from './concentration';
/** Mass fraction of ethanol from mole fraction. */
export { massFractionFromMoleFraction } from './concentration';
/** Volume fraction before mixing: ethanol volume over the sum of the separate pure volumes at t. */
export { volumeFractionBeforeMixing } from './concentration';
/** Mass fraction from a volume fraction before mixing at t. */
export { massFractionFromVolumeFractionBeforeMixing } from './concentration';
/** % vol stated at one temperature restated at another (same liquid, both volumes measured at the new t). */
export { restatePercentVolume } from './concentration';
/** Excess molar volume at x from a mixture density and the two pure densities (all kg/m³), cm³/mol. */
export { excessMolarVolumeFromDensities } from './excess-volume';
/** Excess molar volume of an ethanol–water mixture by the OIML R 22 equation, cm³/mol (zero at the pure ends). */
export { excessMolarVolume } from './excess-volume';
/** Volume after mixing given volumes (L, same t) of pure ethanol and water, and the contraction. */
export { mixContraction } from './excess-volume';
/** Second mixture (or water at 0 % vol) to add to a stock to reach a target % vol, all at one t; mass balance on ethanol. */
export { blendToTarget } from './blending';
/** Water to add to dilute a stock to a target % vol at t, and the final volume after contraction. */
export { dilutionWithWater } from './blending';
/** Volume of pure ethanol at t contained in a stock, L. */
export { ethanolVolumeInStock } from './blending';
/** Beer % vol at 20 °C from the density at t of its distillate made up to a known volume. */
export { analyseDistillate } from './distillate-analysis';
export { OIML_T_MIN, OIML_T_MAX } from './oiml-density';
export { MASS_FRACTION_TOLERANCE } from './mass-fraction-solver';
export type { MixContraction } from './excess-volume';
export type { BlendPlan } from './blending';
export type { DistillateAnalysis } from './distillate-analysis';
export { BEER_STRENGTH_LIMIT } from './distillate-analysis';
export { OIML_A, OIML_B, OIML_C } from './oiml-coefficients';
export { ETHANOL_MOLAR_MASS, WATER_MOLAR_MASS } from './molar-masses';
