import { requireInRange, requirePositive } from '../units/range-guard';
import type { Grams, Litres, SpecificGravity } from '../units/unit-types';

/** One hop addition: mass, alpha acids (% by mass) and minutes in the boil. */
export interface HopAddition { grams: Grams; alphaPercent: number; minutes: number }

/** Tinseth's utilisation: bigness factor 1.65 × 0.000125^(G − 1) times boil-time factor (1 − e^(−0.04 t))/4.15. */
export function tinsethUtilisation(boilGravity: SpecificGravity, minutes: number): number {
  requireInRange('boilGravity', boilGravity, 1, 1.2, 'SG');
  requireInRange('minutes', minutes, 0, 300, 'min');
  return 1.65 * Math.pow(0.000125, boilGravity - 1) * ((1 - Math.exp(-0.04 * minutes)) / 4.15);
}

/** IBU of one addition by Tinseth: utilisation × mg/L of alpha acids added. */
export function tinsethIbu(addition: HopAddition, boilGravity: SpecificGravity, litres: Litres): number {
  requireInRange('grams', addition.grams, 0, 1e5, 'g');
  // Up to 100 % so hop extracts fit; Tinseth's curve itself does not depend on the alpha level.
  requireInRange('alphaPercent', addition.alphaPercent, 0, 100, '%');
  requirePositive('litres', litres, 'L');
  const alphaMgPerLitre = ((addition.alphaPercent / 100) * addition.grams * 1000) / litres;
  return tinsethUtilisation(boilGravity, addition.minutes) * alphaMgPerLitre;
}

/** Total IBU of several additions by Tinseth. */
export function totalTinsethIbu(additions: readonly HopAddition[], boilGravity: SpecificGravity, litres: Litres): number {
  return additions.reduce((sum, a) => sum + tinsethIbu(a, boilGravity, litres), 0);
}

/** BU:GU, the ratio of IBU to the OG's gravity points. */
export function bitternessRatio(ibu: number, og: SpecificGravity): number {
  requireInRange('ibu', ibu, 0, 1000, 'IBU');
  requireInRange('og', og, 1.001, 1.2, 'SG');
  return ibu / ((og - 1) * 1000);
}
