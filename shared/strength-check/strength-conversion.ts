import {
  ethanolGramsPerLitre, ethanolWaterDensity, massFractionFromDensity, massFractionFromEthanolConcentration, massFractionFromMoleFraction,
  massFractionFromPercentVolume, massFractionFromVolumeFractionBeforeMixing, moleFractionFromMassFraction, percentVolumeFromMassFraction,
  volumeFractionBeforeMixing,
} from '../science';

/** The ways a strength of an ethanol–water mixture can be stated. */
export const STRENGTH_QUANTITIES = ['percentVolume20', 'massPercent', 'moleFraction', 'volumeFractionBeforeMixing', 'density', 'gramsPerLitre'] as const;
export type StrengthQuantity = (typeof STRENGTH_QUANTITIES)[number];

/** Label, unit and allowed range of each quantity; the converter form and any API read these. */
export const STRENGTH_QUANTITY_LIMITS: Record<StrengthQuantity, { label: string; unit: string; min: number; max: number; step: number }> = {
  percentVolume20: { label: '% vol at 20 °C', unit: '% vol', min: 0, max: 100, step: 0.01 },
  massPercent: { label: '% mass', unit: '% mass', min: 0, max: 100, step: 0.01 },
  moleFraction: { label: 'Mole fraction of ethanol', unit: '', min: 0, max: 1, step: 0.0001 },
  volumeFractionBeforeMixing: { label: 'Volume fraction before mixing, at t', unit: '%', min: 0, max: 100, step: 0.01 },
  density: { label: 'Density at t', unit: 'kg/m³', min: 770, max: 1010, step: 0.01 },
  gramsPerLitre: { label: 'Ethanol at t', unit: 'g/L', min: 0, max: 800, step: 0.1 },
};

/** Temperatures the OIML R 22 equation covers, °C. */
export const CONVERTER_TEMPERATURE = { min: 0, max: 40 } as const;

/** One mixture stated every way at once, at the temperature t of the sample. */
export interface StrengthConversion {
  temperature: number;
  massPercent: number;
  moleFraction: number;
  /** Ethanol volume per mixture volume, both at 20 °C: the figure on a label. */
  percentVolume20: number;
  /** The same concentration with both volumes at t. */
  percentVolumeAtT: number;
  /** Ethanol volume over the sum of the separate volumes of ethanol and water at t, before they contract. */
  volumeFractionBeforeMixingPercent: number;
  density: number;
  gramsPerLitre: number;
}

function massFractionOf(quantity: StrengthQuantity, value: number, t: number): number {
  switch (quantity) {
    case 'percentVolume20': return massFractionFromPercentVolume(value, 20);
    case 'massPercent': return value / 100;
    case 'moleFraction': return massFractionFromMoleFraction(value);
    case 'volumeFractionBeforeMixing': return massFractionFromVolumeFractionBeforeMixing(value / 100, t);
    case 'density': return massFractionFromDensity(value, t);
    case 'gramsPerLitre': return massFractionFromEthanolConcentration(value, t);
  }
}

/** States a mixture given one quantity at t (0–40 °C) in every other; throws ScienceRangeError out of range. */
export function convertStrength(quantity: StrengthQuantity, value: number, temperature: number): StrengthConversion {
  const p = Math.min(1, Math.max(0, massFractionOf(quantity, value, temperature)));
  return {
    temperature,
    massPercent: 100 * p,
    moleFraction: moleFractionFromMassFraction(p),
    percentVolume20: percentVolumeFromMassFraction(p, 20),
    percentVolumeAtT: percentVolumeFromMassFraction(p, temperature),
    volumeFractionBeforeMixingPercent: 100 * volumeFractionBeforeMixing(p, temperature),
    density: ethanolWaterDensity(p, temperature),
    gramsPerLitre: ethanolGramsPerLitre(p, temperature),
  };
}
