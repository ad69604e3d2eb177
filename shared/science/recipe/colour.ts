import { requireInRange, requirePositive } from '../units/range-guard';
import { kilogramsToPounds, litresToUsGallons } from '../units/unit-conversions';
import type { Litres, UsGallons } from '../units/unit-types';

/** A malt for colour: mass in pounds or kilograms, colour in °L. */
export interface ColourMalt { pounds?: number; kilograms?: number; lovibond: number }

/** Beer colour by Morey: MCU = Σ lb × °L ÷ gal; SRM = 1.4922 × MCU^0.6859; EBC = 1.97 × SRM. */
export interface BeerColour { mcu: number; srm: number; ebc: number }

/** Beer colour by Morey's equation from malts and the batch volume in US gallons. */
export function moreyColour(malts: readonly ColourMalt[], gallons: UsGallons): BeerColour {
  requirePositive('gallons', gallons, 'gal');
  let mcu = 0;
  malts.forEach((m, i) => {
    const pounds = m.pounds ?? (m.kilograms === undefined ? Number.NaN : kilogramsToPounds(m.kilograms));
    requireInRange(`malts[${i}].pounds`, pounds, 0, 2e4, 'lb');
    requireInRange(`malts[${i}].lovibond`, m.lovibond, 0, 700, '°L');
    mcu += (pounds * m.lovibond) / gallons;
  });
  const srm = 1.4922 * Math.pow(mcu, 0.6859);
  return { mcu, srm, ebc: 1.97 * srm };
}

/** Beer colour by Morey with the batch volume in litres (malt masses in kilograms or pounds). */
export function moreyColourMetric(malts: readonly ColourMalt[], litres: Litres): BeerColour {
  return moreyColour(malts, litresToUsGallons(requirePositive('litres', litres, 'L')));
}

/** Malt colour in °L from EBC: SRM = EBC ÷ 1.97, then °L = (SRM + 0.76) ÷ 1.3546. */
export function lovibondFromEbc(ebc: number): number {
  requireInRange('ebc', ebc, 0, 1400, 'EBC');
  return Math.max(0, (ebc / 1.97 + 0.76) / 1.3546);
}

/** Malt colour in EBC from °L: SRM = 1.3546 × °L − 0.76, then EBC = 1.97 × SRM (never below 0). */
export function ebcFromLovibond(lovibond: number): number {
  requireInRange('lovibond', lovibond, 0, 700, '°L');
  return Math.max(0, 1.97 * (1.3546 * lovibond - 0.76));
}
