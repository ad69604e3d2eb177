// Plain aliases: they document the unit at every signature without forcing casts on callers.
/** Specific gravity, dimensionless, at the stated reference temperatures. */
export type SpecificGravity = number;
/** Degrees Plato: grams of extract per 100 g of wort. */
export type DegreesPlato = number;
/** Degrees Brix: grams of sucrose per 100 g of solution. */
export type DegreesBrix = number;
/** Density in kg/m³ (equal to g/L). */
export type KgPerCubicMetre = number;
/** Temperature in degrees Celsius. */
export type Celsius = number;
/** Temperature in degrees Fahrenheit. */
export type Fahrenheit = number;
/** Volume in litres. */
export type Litres = number;
/** Volume in US gallons. */
export type UsGallons = number;
/** Mass in kilograms. */
export type Kilograms = number;
/** Mass in avoirdupois pounds. */
export type Pounds = number;
/** Mass in grams. */
export type Grams = number;
/** Mass in avoirdupois ounces. */
export type Ounces = number;
/** Mass fraction, 0 to 1. */
export type MassFraction = number;
/** Percent, 0 to 100. */
export type Percent = number;
