/** What a member designs; each save stores one of these as a new version. SI units throughout. */
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

export interface OtherItem {
  otherId: number;
  amount: number;
  /** Free unit text such as "g", "tablet", "mL". */
  unit: string;
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
