import { requireInRange, requirePositive } from '../units/range-guard';
import type { Kilograms, Litres, Pounds, SpecificGravity, UsGallons } from '../units/unit-types';
import { PLATO_MAX, sgFromPlato } from '../gravity/plato';
import { waterDensity } from '../water-density/tanaka-water-density';

/** A fermentable in metric terms: mass and extract yield (% of its mass that dissolves as extract). */
export interface MetricFermentable { kilograms: Kilograms; extractYieldPercent: number }

/** A fermentable in US terms: mass and potential in gravity points per pound per US gallon. */
export interface UsFermentable { pounds: Pounds; pointsPerPoundPerGallon: number }

function requireEfficiency(efficiencyPercent: number): number {
  return requireInRange('efficiencyPercent', efficiencyPercent, 1, 100, '%') / 100;
}

/**
 * OG (SG 20/20 °C) from a metric grain bill: extract mass = Σ mass × yield × efficiency, and °P is
 * that mass over the wort's mass, which itself depends on °P; a few fixed-point steps settle it.
 */
export function originalGravityMetric(fermentables: readonly MetricFermentable[], efficiencyPercent: number, litres: Litres): SpecificGravity {
  const efficiency = requireEfficiency(efficiencyPercent);
  requirePositive('litres', litres, 'L');
  let extractKg = 0;
  fermentables.forEach((f, i) => {
    requireInRange(`fermentables[${i}].kilograms`, f.kilograms, 0, 1e4, 'kg');
    requireInRange(`fermentables[${i}].extractYieldPercent`, f.extractYieldPercent, 0, 100, '%');
    extractKg += f.kilograms * (f.extractYieldPercent / 100) * efficiency;
  });
  const water20 = waterDensity(20) / 1000;
  let sg = 1;
  for (let i = 0; i < 30; i++) {
    const plato = (100 * extractKg) / (litres * sg * water20);
    requireInRange('plato', plato, 0, PLATO_MAX, '°P');
    sg = sgFromPlato(plato);
  }
  return sg;
}

/** OG from a US grain bill: points = Σ lb × PPG × efficiency ÷ gallons; OG = 1 + points/1000 (common practice). */
export function originalGravityUs(fermentables: readonly UsFermentable[], efficiencyPercent: number, gallons: UsGallons): SpecificGravity {
  const efficiency = requireEfficiency(efficiencyPercent);
  requirePositive('gallons', gallons, 'gal');
  let points = 0;
  fermentables.forEach((f, i) => {
    requireInRange(`fermentables[${i}].pounds`, f.pounds, 0, 2e4, 'lb');
    requireInRange(`fermentables[${i}].pointsPerPoundPerGallon`, f.pointsPerPoundPerGallon, 0, 50, 'PPG');
    points += f.pounds * f.pointsPerPoundPerGallon * efficiency;
  });
  return requireInRange('og', 1 + points / gallons / 1000, 1, 1.2, 'SG');
}

/** Final gravity from OG and the yeast's apparent attenuation (%). */
export function finalGravityFromAttenuation(og: SpecificGravity, attenuationPercent: number): SpecificGravity {
  requireInRange('og', og, 1, 1.2, 'SG');
  requireInRange('attenuationPercent', attenuationPercent, 0, 100, '%');
  return 1 + (og - 1) * (1 - attenuationPercent / 100);
}
