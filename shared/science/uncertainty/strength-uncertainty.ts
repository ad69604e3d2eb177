import { hydrometerTemperatureCorrection } from '../gravity/gravity-reference';
import { alcoholCorrectedGravity, DEFAULT_WORT_CORRECTION, sgFromRefractometer } from '../gravity/refractometer';
import { abvLinearEstimate } from '../strength/abv-estimates';
import { strengthBreakdown } from '../strength/density-abv';
import type { Celsius, SpecificGravity } from '../units/unit-types';
import { propagate, resolutionUncertainty, UncertainValue } from './measurement-uncertainty';

/** Hydrometer readings of OG and FG with the temperatures they were read at and the instruments' resolutions. */
export interface HydrometerStrengthInput {
  ogReading: SpecificGravity;
  fgReading: SpecificGravity;
  ogTemperature?: Celsius;
  fgTemperature?: Celsius;
  calibrationTemperature?: Celsius;
  hydrometerResolution?: number;
  thermometerResolution?: number;
}

/** Density-based and linear-estimate % vol, each with the uncertainty from instrument resolution. */
export interface StrengthWithUncertainty { densityBased: UncertainValue; linearEstimate: UncertainValue }

/** Strength from hydrometer readings, temperature-corrected, with propagated resolution uncertainty. */
export function hydrometerStrengthUncertainty(input: HydrometerStrengthInput): StrengthWithUncertainty {
  const cal = input.calibrationTemperature ?? 20;
  const inputs = [input.ogReading, input.fgReading, input.ogTemperature ?? cal, input.fgTemperature ?? cal];
  const uSg = resolutionUncertainty(input.hydrometerResolution ?? 0.001);
  const uT = resolutionUncertainty(input.thermometerResolution ?? 0.5);
  const u = [uSg, uSg, uT, uT];
  const corrected = (v: number[]) => [hydrometerTemperatureCorrection(v[0], v[2], cal), hydrometerTemperatureCorrection(v[1], v[3], cal)];
  return {
    densityBased: propagate((v) => { const [og, fg] = corrected(v); return strengthBreakdown(og, fg).percentVolume20; }, inputs, u),
    linearEstimate: propagate((v) => { const [og, fg] = corrected(v); return abvLinearEstimate(og, fg); }, inputs, u),
  };
}

/** Strength from original and current refractometer °Bx, with propagated resolution uncertainty. */
export function refractometerStrengthUncertainty(
  originalBrix: number, currentBrix: number, brixResolution = 0.1, factor = DEFAULT_WORT_CORRECTION,
): StrengthWithUncertainty {
  const u = resolutionUncertainty(brixResolution);
  const gravities = (v: number[]) => [sgFromRefractometer(v[0], factor), alcoholCorrectedGravity(v[0], v[1], factor)];
  return {
    densityBased: propagate((v) => { const [og, fg] = gravities(v); return strengthBreakdown(og, fg).percentVolume20; }, [originalBrix, currentBrix], [u, u]),
    linearEstimate: propagate((v) => { const [og, fg] = gravities(v); return abvLinearEstimate(og, fg); }, [originalBrix, currentBrix], [u, u]),
  };
}
