// Public entry of gravity: each function with its one-line summary; types and constants follow.
/** °Plato from specific gravity 20/20 °C (sucrose-table cubic). */
export { platoFromSg } from './plato';
/** Specific gravity 20/20 °C from °Plato (inverse of the sucrose-table cubic). */
export { sgFromPlato } from './plato';
/** °Brix from specific gravity 20/20 °C. */
export { brixFromSg } from './brix';
/** Specific gravity 20/20 °C from °Brix. */
export { sgFromBrix } from './brix';
/** Restates SG t1/t1 as SG t2/t2. */
export { restateSpecificGravity } from './gravity-reference';
/** SG 60/60 °F from SG 20/20 °C. */
export { sg6060FromSg2020 } from './gravity-reference';
/** SG 20/20 °C from SG 60/60 °F. */
export { sg2020FromSg6060 } from './gravity-reference';
/** Hydrometer reading at the sample's temperature corrected to the calibration temperature (Tanaka water density). */
export { hydrometerTemperatureCorrection } from './gravity-reference';
/** SG 20/20 °C of unfermented wort from a refractometer °Bx reading and a wort correction factor. */
export { sgFromRefractometer } from './refractometer';
/** Wort correction factor from a refractometer reading and a paired hydrometer SG of the same wort. */
export { wortCorrectionFactor } from './refractometer';
/** Gravity of fermenting wort from original and current refractometer °Bx: ethanol raises the refractive index, so the reading must be corrected. */
export { alcoholCorrectedGravity } from './refractometer';
export { PLATO_MIN, PLATO_MAX, SG_MIN, SG_MAX } from './plato';
export { BRIX_MIN, BRIX_MAX } from './brix';
export { SIXTY_F_IN_C } from './gravity-reference';
export { DEFAULT_WORT_CORRECTION } from './refractometer';
