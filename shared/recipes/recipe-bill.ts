import { originalGravityMetric } from '@shared/science';
import { Fermentable, FermentableKind, IngredientCatalogue } from './ingredient';
import { RecipeDesign } from './recipe-design';
import { FermentableShare } from './recipe-prediction-model';

/** Kinds whose extract comes from the mash, so the brewhouse efficiency applies to them. */
export const MASHED_KINDS: readonly FermentableKind[] = ['grain', 'adjunct'];

/** One line of the fermentable bill with its catalogue entry. */
export interface BillItem {
  index: number;
  entry: Fermentable;
  amountKg: number;
}

/** The design's fermentables found in the catalogue; each one missing is named in `problems`. */
export function billOf(design: RecipeDesign, catalogue: IngredientCatalogue, problems: string[]): BillItem[] {
  return design.fermentables.flatMap((item, index) => {
    const entry = catalogue.fermentables.find((each) => each.id === item.fermentableId);
    if (!entry) problems.push(`Fermentable ${index + 1} is not in the catalogue.`);
    return entry ? [{ index, entry, amountKg: item.amountKg }] : [];
  });
}

/** Kilograms of the mashed kinds: what the mash water and the strike temperature are reckoned on. */
export function mashedKilograms(bill: BillItem[]): number {
  return bill.filter(({ entry }) => MASHED_KINDS.includes(entry.kind)).reduce((sum, item) => sum + item.amountKg, 0);
}

// The design's efficiency is the brewhouse efficiency into the fermenter: the share of the mashed kinds'
// extract that reaches the batch volume. Other kinds dissolve whole.
export function originalGravity(bill: BillItem[], design: RecipeDesign): number {
  const fermentables = bill.map(({ entry, amountKg }) => ({
    kilograms: amountKg,
    extractYieldPercent: MASHED_KINDS.includes(entry.kind) ? (entry.extractPercent * design.mashEfficiencyPercent) / 100 : entry.extractPercent,
  }));
  return originalGravityMetric(fermentables, 100, design.batchVolumeLitres);
}

/** Each line's share of the bill by weight, flagged when above the entry's usual maximum. */
export function sharesOf(bill: BillItem[]): FermentableShare[] {
  const total = bill.reduce((sum, item) => sum + item.amountKg, 0);
  return bill.map(({ index, entry, amountKg }) => {
    const sharePercent = total > 0 ? (100 * amountKg) / total : 0;
    return {
      index,
      fermentableId: entry.id,
      name: entry.name,
      amountKg,
      sharePercent,
      maxSharePercent: entry.maxSharePercent,
      aboveUsualMax: entry.maxSharePercent !== null && sharePercent > entry.maxSharePercent,
    };
  });
}
