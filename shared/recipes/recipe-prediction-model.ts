import type { StrengthBreakdown } from '@shared/science';
import { HopUse } from './recipe-design';

/** One fermentable's part of the grain bill. */
export interface FermentableShare {
  index: number;
  fermentableId: number;
  name: string;
  amountKg: number;
  /** % of the bill by mass. */
  sharePercent: number;
  maxSharePercent: number | null;
  aboveUsualMax: boolean;
}

/** One hop addition's bitterness. */
export interface HopBitterness {
  index: number;
  hopId: number;
  name: string;
  use: HopUse;
  time: number;
  amountGrams: number;
  ibu: number;
}

/** The water a brew day needs, from the co-op's brewhouse settings. */
export interface RecipeWaterPlan {
  strikeLitres: number;
  spargeLitres: number;
  strikeTemperatureC: number;
  preBoilLitres: number;
  /** Gravity before the boil, from the OG's extract in the kettle's wort. */
  preBoilGravity: number;
  /** Extract in the kettle over the mashed kinds' potential, implied by the brewhouse efficiency. */
  mashEfficiencyPercent: number;
  /** From the brewhouse settings; null while unknown. */
  kettleCapacityLitres: number | null;
  /** The pre-boil volume does not fit the kettle. */
  exceedsKettle: boolean;
}

/** Everything the editor predicts for a design; a figure is null while its inputs are missing. */
export interface RecipePrediction {
  og: number | null;
  fg: number | null;
  /** % vol by the linear OG/FG rule. */
  abvEstimate: number | null;
  /** % vol at 20 °C by Balling and the densities of beer and ethanol. */
  abvDensityBased: number | null;
  strength: StrengthBreakdown | null;
  ibu: number | null;
  hopBitterness: HopBitterness[];
  colourSrm: number | null;
  colourEbc: number | null;
  buGu: number | null;
  shares: FermentableShare[];
  waterPlan: RecipeWaterPlan | null;
  /** Why a figure could not be predicted, in words. */
  problems: string[];
}
