import { IngredientKind, shownAmountText, UnitSystem } from '@shared/recipes';
import { ouncesToGrams, poundsToKilograms } from '@shared/science';
import { StockUnit } from './stock-lot';

/** The units a lot of each kind may be counted in: malt and hops by mass, yeast by the pack. */
export const STOCK_UNITS_BY_KIND: Record<IngredientKind, readonly StockUnit[]> = {
  fermentables: ['kg'],
  hops: ['kg'],
  yeasts: ['each'],
  others: ['kg', 'L', 'each'],
};

/** A unit a person types a quantity in. */
export type StockEntryUnit = 'kg' | 'lb' | 'g' | 'oz' | 'mL' | 'L' | 'each';

/** Pound and ounce are exact by the 1959 international yard and pound agreement. */
const ENTRY: Record<StockEntryUnit, [StockUnit, (amount: number) => number]> = {
  kg: ['kg', (x) => x],
  lb: ['kg', poundsToKilograms],
  g: ['kg', (x) => x / 1000],
  oz: ['kg', (x) => ouncesToGrams(x) / 1000],
  mL: ['L', (x) => x / 1000],
  L: ['L', (x) => x],
  each: ['each', (x) => x],
};

/** The entry units offered for a kind, in the person's unit system (other additions keep their fixed units). */
export function entryUnitsFor(kind: IngredientKind, system: UnitSystem): StockEntryUnit[] {
  if (kind === 'fermentables') return system === 'us' ? ['lb'] : ['kg'];
  if (kind === 'hops') return system === 'us' ? ['oz'] : ['g'];
  if (kind === 'yeasts') return ['each'];
  return ['g', 'kg', 'mL', 'L', 'each'];
}

/** A typed quantity in the stored SI unit. */
export function toStockQuantity(amount: number, entryUnit: StockEntryUnit): { unit: StockUnit; quantity: number } {
  const [unit, convert] = ENTRY[entryUnit];
  return { unit, quantity: convert(amount) };
}

const trimmed = (value: number, decimals: number) => String(Number(value.toFixed(decimals)));

/** A stored quantity as short text in the person's units, e.g. "4.5 kg", "25 g", "9.92 lb", "2 each". */
export function stockAmountText(kind: IngredientKind, unit: StockUnit, quantity: number, system: UnitSystem): string {
  if (unit === 'each') return `${trimmed(quantity, 2)} each`;
  if (kind === 'fermentables') return shownAmountText('grain-mass', quantity, system);
  if (kind === 'hops') return shownAmountText('hop-mass', quantity * 1000, system);
  if (unit === 'kg') return quantity < 1 ? `${trimmed(quantity * 1000, 1)} g` : `${trimmed(quantity, 3)} kg`;
  return quantity < 1 ? `${trimmed(quantity * 1000, 0)} mL` : `${trimmed(quantity, 3)} L`;
}
