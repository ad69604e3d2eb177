// Public entry of water-density: each function with its one-line summary; types and constants follow.
/** Density of pure water at t by the CIPM equation (Tanaka et al. */
export { waterDensity } from './tanaka-water-density';
export { WATER_T_MIN, WATER_T_MAX } from './tanaka-water-density';
