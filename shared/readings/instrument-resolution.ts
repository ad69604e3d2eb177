import { Instrument } from './gravity-reading';

/**
 * Smallest change in SG each instrument shows (common practice): hydrometers are graduated in
 * 0.001; a refractometer's 0.2 °Bx is about 0.0008 SG; bench density meters read 0.1 kg/m³
 * (0.0001); floating loggers report 0.001 but wander by about twice that.
 */
export const INSTRUMENT_RESOLUTION_SG: Record<Instrument, number> = {
  hydrometer: 0.001,
  refractometer: 0.001,
  'density-meter': 0.0001,
  logger: 0.002,
};
