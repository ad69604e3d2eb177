import {
  alcoholCorrectedGravity,
  hydrometerTemperatureCorrection,
  restateSpecificGravity,
  sgFromPlato,
  sgFromRefractometer,
  waterDensity,
} from '@shared/science';
import { GravityUnit, Instrument } from './gravity-reading';

/** A raw reading as the correction needs it. */
export interface RawGravity {
  instrument: Instrument;
  rawValue: number;
  rawUnit: GravityUnit;
  sampleTemperatureC: number | null;
  calibrationTemperatureC: number | null;
}

/** What the batch supplies: its refractometer factor and, once fermentation started, the original °Bx. */
export interface CorrectionContext {
  wortCorrectionFactor: number;
  /** Set when the reading was taken after pitching: the refractometer reading needs the alcohol correction. */
  originalBrix: number | null;
}

/** The corrected gravity and what the correction used, stored beside the raw value. */
export interface CorrectedGravity {
  correctedSg: number;
  correctionFactor: number | null;
  originalBrix: number | null;
  calibrationTemperatureC: number | null;
}

const REFERENCE_C = 20;

/** SG t/t of a density read at t, restated to 20/20 °C (excess density taken as the water's, as for hydrometers). */
function sgFromDensity(kgPerM3: number, temperatureC: number): number {
  return restateSpecificGravity(kgPerM3 / waterDensity(temperatureC), temperatureC, REFERENCE_C);
}

function asSg(value: number, unit: GravityUnit): number {
  return unit === 'plato' ? sgFromPlato(value) : value;
}

function hydrometerSg(raw: RawGravity): CorrectedGravity {
  const calibration = raw.calibrationTemperatureC ?? REFERENCE_C;
  const read = asSg(raw.rawValue, raw.rawUnit);
  const atCalibration = raw.sampleTemperatureC === null ? read : hydrometerTemperatureCorrection(read, raw.sampleTemperatureC, calibration);
  const sg = calibration === REFERENCE_C ? atCalibration : restateSpecificGravity(atCalibration, calibration, REFERENCE_C);
  return { correctedSg: sg, correctionFactor: null, originalBrix: null, calibrationTemperatureC: calibration };
}

function refractometerSg(raw: RawGravity, context: CorrectionContext): CorrectedGravity {
  const factor = context.wortCorrectionFactor;
  const sg = context.originalBrix === null
    ? sgFromRefractometer(raw.rawValue, factor)
    : alcoholCorrectedGravity(context.originalBrix, raw.rawValue, factor);
  return { correctedSg: sg, correctionFactor: factor, originalBrix: context.originalBrix, calibrationTemperatureC: null };
}

function densityMeterSg(raw: RawGravity): CorrectedGravity {
  const t = raw.sampleTemperatureC ?? REFERENCE_C;
  const sg = raw.rawUnit === 'kg-m3' ? sgFromDensity(raw.rawValue, t) : asSg(raw.rawValue, raw.rawUnit);
  return { correctedSg: sg, correctionFactor: null, originalBrix: null, calibrationTemperatureC: null };
}

/**
 * Gravity of a raw reading as SG 20/20 °C, by the shared science library: hydrometers corrected
 * for sample temperature against their calibration; refractometers divided by the wort correction
 * factor and, during fermentation, corrected for alcohol; density meters' kg/m³ over water's
 * density. Loggers and density meters reading SG or °P compensate temperature themselves.
 */
export function correctedGravity(raw: RawGravity, context: CorrectionContext): CorrectedGravity {
  switch (raw.instrument) {
    case 'hydrometer':
      return hydrometerSg(raw);
    case 'refractometer':
      return refractometerSg(raw, context);
    case 'density-meter':
      return densityMeterSg(raw);
    case 'logger':
      return { correctedSg: asSg(raw.rawValue, raw.rawUnit), correctionFactor: null, originalBrix: null, calibrationTemperatureC: null };
  }
}
