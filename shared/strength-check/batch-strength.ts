import { resolutionUncertainty, strengthBreakdown, StrengthBreakdown, toleranceVerdict, ToleranceVerdict, UncertainValue } from '../science';
import { propagate } from '../science/uncertainty/measurement-uncertainty';

/** A gravity the check uses: SG 20/20 °C and the resolution (SG) of the instrument that read it. */
export interface GravityUsed { sg: number; resolutionSg: number }

/** One step of the working, in the order the page and the record show it. */
export interface StrengthStep { key: keyof StrengthBreakdown; label: string; value: number; unit: string }

/** The two OG/FG estimates beside the density-based % vol at 20 °C, each with its expanded uncertainty. */
export interface BatchStrengthFigures {
  steps: StrengthStep[];
  densityBased: UncertainValue;
  linearEstimate: UncertainValue;
  nonLinearEstimate: UncertainValue;
}

const STEPS: readonly Omit<StrengthStep, 'value'>[] = [
  { key: 'originalExtract', label: 'Original extract (OE)', unit: '°P' },
  { key: 'apparentExtract', label: 'Apparent extract (AE)', unit: '°P' },
  { key: 'realExtract', label: 'Real extract (RE), Balling', unit: '°P' },
  { key: 'alcoholByMass', label: 'Alcohol by mass (ABW)', unit: '% mass' },
  { key: 'beerDensity20', label: 'Beer density at 20 °C', unit: 'kg/m³' },
  { key: 'ethanolDensity20', label: 'Ethanol density at 20 °C', unit: 'kg/m³' },
  { key: 'percentVolume20', label: '% vol at 20 °C = ABW × beer density ÷ ethanol density', unit: '% vol' },
];

/**
 * The strength of a batch from OG and FG with every step, and the uncertainty propagated from the
 * resolution of the instruments that read them (GUM, first order, k = 2).
 */
export function batchStrengthFigures(og: GravityUsed, fg: GravityUsed): BatchStrengthFigures {
  const breakdown = strengthBreakdown(og.sg, fg.sg);
  const u = [resolutionUncertainty(og.resolutionSg), resolutionUncertainty(fg.resolutionSg)];
  const of = (key: 'percentVolume20' | 'linearEstimate' | 'nonLinearEstimate') => propagate((v) => strengthBreakdown(v[0], v[1])[key], [og.sg, fg.sg], u);
  return {
    steps: STEPS.map((step) => ({ ...step, value: breakdown[step.key] })),
    densityBased: of('percentVolume20'),
    linearEstimate: of('linearEstimate'),
    nonLinearEstimate: of('nonLinearEstimate'),
  };
}

/** A declared strength held against the density-based figure with a product class's tolerance. */
export interface DeclaredStrengthVerdict {
  declaredPercentVolume: number;
  toleranceClassName: string;
  tolerancePercentVolume: number;
  verdict: ToleranceVerdict;
}

/** Within, outside or undecided, allowing for the expanded uncertainty of the density-based figure. */
export function declaredStrengthVerdict(figures: BatchStrengthFigures, declared: number, toleranceClass: { name: string; tolerancePercentVolume: number }): DeclaredStrengthVerdict {
  return {
    declaredPercentVolume: declared,
    toleranceClassName: toleranceClass.name,
    tolerancePercentVolume: toleranceClass.tolerancePercentVolume,
    verdict: toleranceVerdict(declared, figures.densityBased, toleranceClass.tolerancePercentVolume),
  };
}

/** What the app says beside every declared-strength verdict. */
export const DECLARED_STRENGTH_CAUTION =
  'Local labelling and excise rules decide what a label must state and the tolerance it is held to; this check is an aid, and the brewer and the local authority decide.';
