/** What a member designs; each save stores one of these as a new version. SI units throughout. */

/**
 * The shape of a stored design. 1: other additions had free-text units; 2: units from OTHER_UNITS.
 * A version records the format it was saved in.
 */
export const RECIPE_DESIGN_FORMAT = 2;

export const HOP_USES = ['first wort', 'boil', 'whirlpool', 'dry hop'] as const;
export type HopUse = (typeof HOP_USES)[number];

export interface FermentableItem {
  fermentableId: number;
  amountKg: number;
}

export interface HopItem {
  hopId: number;
  amountGrams: number;
  /** Minutes before the end of the boil (boil, first wort), of whirlpool stand, or days for dry hop. */
  time: number;
  use: HopUse;
}

/** Units an other addition is measured in; "each" counts pieces (tablets, sticks, pods). */
export const OTHER_UNITS = ['g', 'kg', 'mL', 'L', 'each'] as const;
export type OtherUnit = (typeof OTHER_UNITS)[number];

export interface OtherItem {
  otherId: number;
  amount: number;
  unit: OtherUnit;
  /** When it goes in, e.g. "boil 10 min", "mash", "bottling". */
  when: string;
}

export interface MashStep {
  name: string;
  temperatureC: number;
  minutes: number;
}

export interface RecipeDesign {
  name: string;
  styleId: number | null;
  batchVolumeLitres: number;
  mashEfficiencyPercent: number;
  boilMinutes: number;
  fermentables: FermentableItem[];
  hops: HopItem[];
  yeastId: number | null;
  others: OtherItem[];
  mashSteps: MashStep[];
  notes: string;
}
