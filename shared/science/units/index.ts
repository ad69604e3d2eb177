// Public entry of units: each function with its one-line summary; types and constants follow.
/** Converts °C to °F. */
export { celsiusToFahrenheit } from './unit-conversions';
/** Converts °F to °C. */
export { fahrenheitToCelsius } from './unit-conversions';
/** Converts litres to US gallons. */
export { litresToUsGallons } from './unit-conversions';
/** Converts US gallons to litres. */
export { usGallonsToLitres } from './unit-conversions';
/** Converts kilograms to pounds. */
export { kilogramsToPounds } from './unit-conversions';
/** Converts pounds to kilograms. */
export { poundsToKilograms } from './unit-conversions';
/** Converts grams to ounces. */
export { gramsToOunces } from './unit-conversions';
/** Converts ounces to grams. */
export { ouncesToGrams } from './unit-conversions';
/** Converts a density in kg/m³ to g/cm³. */
export { kgPerCubicMetreToGramsPerCubicCentimetre } from './unit-conversions';
export type { ScienceRangeReason } from './science-range-error';
export { ScienceRangeError } from './science-range-error';
export type {
  SpecificGravity, DegreesPlato, DegreesBrix, KgPerCubicMetre, Celsius, Fahrenheit, Litres, UsGallons,
  Kilograms, Pounds, Grams, Ounces, MassFraction, Percent,
} from './unit-types';
