/**
 * Every limit on recipe, catalogue and brewhouse input, defined once: the server's zod schemas and
 * the client's validators both read these, so the two never disagree.
 */
export interface NumberLimit {
  min: number;
  max: number;
  unit: string;
}

const range = (min: number, max: number, unit: string): NumberLimit => ({ min, max, unit });

/** Names of recipes, catalogue entries and styles. */
export const NAME_MAX_LENGTH = 100;

export const RECIPE_LIMITS = {
  batchVolumeLitres: range(0.5, 2000, 'L'),
  mashEfficiencyPercent: range(20, 100, '%'),
  boilMinutes: range(0, 300, 'min'),
  fermentableAmountKg: range(0.001, 1000, 'kg'),
  hopAmountGrams: range(0.001, 10000, 'g'),
  /** Minutes for boil, first-wort and whirlpool additions, days for dry hops. */
  hopTime: range(0, 300, 'min or days'),
  otherAmount: range(0.001, 100000, 'of its unit'),
  mashTemperatureC: range(30, 80, '°C'),
  mashMinutes: range(1, 300, 'min'),
  mashStepNameLength: 60,
  otherWhenLength: 60,
  notesLength: 5000,
  fermentables: 30,
  hops: 40,
  others: 30,
  mashSteps: 10,
} as const;

export const CATALOGUE_LIMITS = {
  extractPercent: range(0, 100, '%'),
  colourLovibond: range(0, 600, '°L'),
  maxSharePercent: range(0, 100, '%'),
  alphaAcidPercent: range(0, 100, '%'),
  attenuationPercent: range(0, 100, '%'),
  temperatureC: range(-5, 50, '°C'),
} as const;

export const BREWHOUSE_LIMITS = {
  boilOffLitresPerHour: range(0, 100, 'L/h'),
  grainAbsorptionLitresPerKg: range(0, 5, 'L/kg'),
  kettleLossLitres: range(0, 200, 'L'),
  fermenterLossLitres: range(0, 200, 'L'),
  mashThicknessLitresPerKg: range(1.5, 8, 'L/kg'),
  grainTemperatureC: range(-10, 45, '°C'),
  mashTunHeatCapacityKjPerK: range(0, 100, 'kJ/K'),
} as const;

/** Ranges a style target's bounds may take (OG and FG as SG 20/20 °C, ABV % vol, IBU, SRM). */
export const STYLE_TARGET_LIMITS = {
  og: range(1, 1.2, ''),
  fg: range(0.98, 1.1, ''),
  abv: range(0, 20, '% vol'),
  ibu: range(0, 150, 'IBU'),
  colourSrm: range(0, 80, 'SRM'),
} as const;

/** The largest catalogue CSV file accepted, in bytes of UTF-8 (1 MB). */
export const CATALOGUE_CSV_MAX_BYTES = 1_000_000;
/** The same limit in words, as the import dialog states it. */
export const CATALOGUE_CSV_MAX_TEXT = '1 MB';
