import {
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  gramsToOunces,
  kilogramsToPounds,
  litresToUsGallons,
  ouncesToGrams,
  poundsToKilograms,
  usGallonsToLitres,
} from '@shared/science';
import { UnitSystem } from './recipes-api';

/** The kinds of amount a recipe shows, each stored in one SI unit. */
export type RecipeQuantity = 'grain-mass' | 'hop-mass' | 'volume' | 'temperature';

interface QuantityUnits {
  si: string;
  us: string;
  toUs(si: number): number;
  fromUs(us: number): number;
}

const UNITS: Record<RecipeQuantity, QuantityUnits> = {
  'grain-mass': { si: 'kg', us: 'lb', toUs: kilogramsToPounds, fromUs: poundsToKilograms },
  'hop-mass': { si: 'g', us: 'oz', toUs: gramsToOunces, fromUs: ouncesToGrams },
  volume: { si: 'L', us: 'gal', toUs: litresToUsGallons, fromUs: usGallonsToLitres },
  temperature: { si: '°C', us: '°F', toUs: celsiusToFahrenheit, fromUs: fahrenheitToCelsius },
};

/** The unit symbol an amount is shown in. */
export function unitLabel(quantity: RecipeQuantity, system: UnitSystem): string {
  return system === 'us' ? UNITS[quantity].us : UNITS[quantity].si;
}

/** A stored (SI) amount in the person's unit system. */
export function toDisplayUnits(quantity: RecipeQuantity, siValue: number, system: UnitSystem): number {
  return system === 'us' ? UNITS[quantity].toUs(siValue) : siValue;
}

/** An amount typed in the person's unit system, in the stored SI unit. */
export function fromDisplayUnits(quantity: RecipeQuantity, displayValue: number, system: UnitSystem): number {
  return system === 'us' ? UNITS[quantity].fromUs(displayValue) : displayValue;
}

/** An amount moved from one unit system to another, as when a person switches while editing. */
export function convertBetweenSystems(quantity: RecipeQuantity, value: number, from: UnitSystem, to: UnitSystem): number {
  return from === to ? value : toDisplayUnits(quantity, fromDisplayUnits(quantity, value, from), to);
}

const TEXT_DECIMALS: Record<RecipeQuantity, Record<UnitSystem, number>> = {
  'grain-mass': { metric: 3, us: 2 },
  'hop-mass': { metric: 1, us: 2 },
  volume: { metric: 1, us: 2 },
  temperature: { metric: 1, us: 0 },
};

/** A stored amount as short text in the person's units, e.g. "4.5 kg" or "9.92 lb". */
export function shownAmountText(quantity: RecipeQuantity, siValue: number, system: UnitSystem): string {
  const shown = Number(toDisplayUnits(quantity, siValue, system).toFixed(TEXT_DECIMALS[quantity][system]));
  return `${shown} ${unitLabel(quantity, system)}`;
}
