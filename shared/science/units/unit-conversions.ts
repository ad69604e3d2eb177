import { requireInRange } from './range-guard';
import type { Celsius, Fahrenheit, Grams, Kilograms, Litres, Ounces, Pounds, UsGallons } from './unit-types';

// Exact definitions: 1 US gal = 231 in³ = 3.785411784 L; 1 lb = 0.45359237 kg; 1 oz = lb/16.
const LITRES_PER_US_GALLON = 3.785411784;
const KG_PER_POUND = 0.45359237;
const GRAMS_PER_OUNCE = (KG_PER_POUND * 1000) / 16;
const ABSOLUTE_ZERO_C = -273.15;
const BIG = 1e12;

/** Converts °C to °F. */
export function celsiusToFahrenheit(celsius: Celsius): Fahrenheit {
  requireInRange('celsius', celsius, ABSOLUTE_ZERO_C, BIG, '°C');
  return celsius * 1.8 + 32;
}

/** Converts °F to °C. */
export function fahrenheitToCelsius(fahrenheit: Fahrenheit): Celsius {
  requireInRange('fahrenheit', fahrenheit, ABSOLUTE_ZERO_C * 1.8 + 32, BIG, '°F');
  return (fahrenheit - 32) / 1.8;
}

/** Converts litres to US gallons. */
export function litresToUsGallons(litres: Litres): UsGallons {
  return requireInRange('litres', litres, 0, BIG, 'L') / LITRES_PER_US_GALLON;
}

/** Converts US gallons to litres. */
export function usGallonsToLitres(gallons: UsGallons): Litres {
  return requireInRange('gallons', gallons, 0, BIG, 'gal') * LITRES_PER_US_GALLON;
}

/** Converts kilograms to pounds. */
export function kilogramsToPounds(kilograms: Kilograms): Pounds {
  return requireInRange('kilograms', kilograms, 0, BIG, 'kg') / KG_PER_POUND;
}

/** Converts pounds to kilograms. */
export function poundsToKilograms(pounds: Pounds): Kilograms {
  return requireInRange('pounds', pounds, 0, BIG, 'lb') * KG_PER_POUND;
}

/** Converts grams to ounces. */
export function gramsToOunces(grams: Grams): Ounces {
  return requireInRange('grams', grams, 0, BIG, 'g') / GRAMS_PER_OUNCE;
}

/** Converts ounces to grams. */
export function ouncesToGrams(ounces: Ounces): Grams {
  return requireInRange('ounces', ounces, 0, BIG, 'oz') * GRAMS_PER_OUNCE;
}

/** Converts a density in kg/m³ to g/cm³. */
export function kgPerCubicMetreToGramsPerCubicCentimetre(density: number): number {
  return requireInRange('density', density, 0, BIG, 'kg/m³') / 1000;
}
