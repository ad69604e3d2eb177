import { requireInRange, requirePositive } from '../units/range-guard';
import { ScienceRangeError } from '../units/science-range-error';
import type { Celsius, Litres } from '../units/unit-types';
import { massFractionFromPercentVolume } from './concentration';
import { ethanolWaterDensity, pureEthanolDensity } from './oiml-density';

/** A blending plan: what to add, and what comes out after contraction (volumes at the stated t). */
export interface BlendPlan {
  addedVolume: Litres;
  finalVolume: Litres;
  finalPercentVolume: number;
  /** Separate volumes minus the final volume: what the mix loses to contraction. */
  contractionVolume: Litres;
}

interface Stock { volume: number; percentVolume: number }

function massAndEthanol(stock: Stock, temperature: Celsius): { mass: number; ethanol: number; density: number } {
  const p = massFractionFromPercentVolume(stock.percentVolume, temperature);
  const density = ethanolWaterDensity(p, temperature);
  return { mass: stock.volume * density, ethanol: stock.volume * density * p, density };
}

/** Second mixture (or water at 0 % vol) to add to a stock to reach a target % vol, all at one t; mass balance on ethanol. */
export function blendToTarget(
  volume: Litres, percentVolume: number, addPercentVolume: number, targetPercentVolume: number, temperature: Celsius = 20,
): BlendPlan {
  requirePositive('volume', volume, 'L');
  requireInRange('targetPercentVolume', targetPercentVolume, 0, 100, '% vol');
  const low = Math.min(percentVolume, addPercentVolume);
  const high = Math.max(percentVolume, addPercentVolume);
  if (targetPercentVolume < low || targetPercentVolume > high || targetPercentVolume === addPercentVolume) {
    throw new ScienceRangeError('targetPercentVolume', targetPercentVolume, low, high, '% vol', 'inconsistent',
      `targetPercentVolume = ${targetPercentVolume} % vol must lie between the stock (${percentVolume}) and the addition (${addPercentVolume}), short of the addition`);
  }
  const stock = massAndEthanol({ volume, percentVolume }, temperature);
  const perLitre = massAndEthanol({ volume: 1, percentVolume: addPercentVolume }, temperature);
  const target = massFractionFromPercentVolume(targetPercentVolume, temperature);
  // target·(m1 + V2·rho2) = e1 + V2·e2  →  V2 = (target·m1 − e1) / (e2 − target·rho2)
  const addedVolume = (target * stock.mass - stock.ethanol) / (perLitre.ethanol - target * perLitre.mass);
  if (!Number.isFinite(addedVolume) || addedVolume < 0 || addedVolume > 1e6 * volume) {
    throw new ScienceRangeError('targetPercentVolume', targetPercentVolume, low, high, '% vol', 'inconsistent',
      `targetPercentVolume = ${targetPercentVolume} % vol is so close to the addition (${addPercentVolume}) that it needs over a million times the stock`);
  }
  const finalVolume = (stock.mass + addedVolume * perLitre.mass) / ethanolWaterDensity(target, temperature);
  return { addedVolume, finalVolume, finalPercentVolume: targetPercentVolume, contractionVolume: volume + addedVolume - finalVolume };
}

/** Water to add to dilute a stock to a target % vol at t, and the final volume after contraction. */
export function dilutionWithWater(volume: Litres, percentVolume: number, targetPercentVolume: number, temperature: Celsius = 20): BlendPlan {
  requireInRange('percentVolume', percentVolume, 0, 100, '% vol');
  return blendToTarget(volume, percentVolume, 0, targetPercentVolume, temperature);
}

/** Volume of pure ethanol at t contained in a stock, L. */
export function ethanolVolumeInStock(volume: Litres, percentVolume: number, temperature: Celsius = 20): Litres {
  requirePositive('volume', volume, 'L');
  const { ethanol } = massAndEthanol({ volume, percentVolume }, temperature);
  return ethanol / pureEthanolDensity(temperature);
}
