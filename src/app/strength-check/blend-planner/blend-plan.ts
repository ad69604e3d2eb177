import { blendToTarget, dilutionWithWater, mixContraction, ScienceRangeError } from '@shared/science';

/** What the planner works out: mixing pure ethanol and water, diluting with water, or blending two mixtures. */
export type BlendMode = 'mix' | 'dilute' | 'blend';

export interface BlendInputs {
  mode: BlendMode;
  /** mix: mL of ethanol; dilute/blend: L of the stock. */
  first: number | null;
  /** mix: mL of water; dilute/blend: the stock's % vol. */
  second: number | null;
  /** dilute/blend: the target % vol. */
  target: number | null;
  /** blend: the % vol of what is added. */
  addition: number | null;
  temperature: number | null;
}

/** The plan in the units the form shows (mL for mix, L otherwise), or why it cannot be made. */
export interface BlendOutcome {
  added: number | null;
  finalVolume: number;
  separateVolume: number;
  contractionVolume: number;
  percentVolume: number;
  unit: 'mL' | 'L';
}

/** Works out the plan, or returns a sentence saying what is missing or out of range. */
export function blendPlanOrReason(i: BlendInputs): BlendOutcome | string {
  const needed = i.mode === 'blend' ? [i.first, i.second, i.target, i.addition, i.temperature] : i.mode === 'dilute' ? [i.first, i.second, i.target, i.temperature] : [i.first, i.second, i.temperature];
  if (needed.some((v) => v === null || !Number.isFinite(v))) return 'Fill in every field.';
  try {
    if (i.mode === 'mix') {
      const mix = mixContraction(i.first! / 1000, i.second! / 1000, i.temperature!);
      return { added: null, finalVolume: mix.finalVolume * 1000, separateVolume: i.first! + i.second!, contractionVolume: mix.contractionVolume * 1000, percentVolume: mix.percentVolume, unit: 'mL' };
    }
    const plan = i.mode === 'dilute'
      ? dilutionWithWater(i.first!, i.second!, i.target!, i.temperature!)
      : blendToTarget(i.first!, i.second!, i.addition!, i.target!, i.temperature!);
    return { added: plan.addedVolume, finalVolume: plan.finalVolume, separateVolume: i.first! + plan.addedVolume, contractionVolume: plan.contractionVolume, percentVolume: plan.finalPercentVolume, unit: 'L' };
  } catch (error) {
    if (error instanceof ScienceRangeError) return `Out of range: ${error.message}.`;
    throw error;
  }
}
