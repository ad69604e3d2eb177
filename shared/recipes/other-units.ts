import { OtherUnit } from './recipe-design';

// Free-text units that older designs and recipe files used, and where each sits in the fixed list.
// Factors: metric teaspoon 5 mL and tablespoon 15 mL (common practice); ounce 28.349523125 g and
// pound 0.45359237 kg (exact by the 1959 international yard and pound agreement).
const FREE_TEXT_UNITS: Record<string, [OtherUnit, number]> = {
  g: ['g', 1], gram: ['g', 1], grams: ['g', 1], gr: ['g', 1],
  kg: ['kg', 1], kilogram: ['kg', 1], kilograms: ['kg', 1],
  ml: ['mL', 1], millilitre: ['mL', 1], millilitres: ['mL', 1], milliliter: ['mL', 1], milliliters: ['mL', 1],
  l: ['L', 1], litre: ['L', 1], litres: ['L', 1], liter: ['L', 1], liters: ['L', 1],
  tsp: ['mL', 5], tbsp: ['mL', 15], oz: ['g', 28.349523125], lb: ['kg', 0.45359237],
  each: ['each', 1], pc: ['each', 1], pcs: ['each', 1], piece: ['each', 1], pieces: ['each', 1],
};

/**
 * An other addition written with a free-text unit, in the fixed units. A unit outside the list
 * (tablet, stick, pod…) counts pieces, and its word is kept in `when` so nothing is lost.
 */
export function otherFromFreeText(item: { amount: number; unit: string; when: string }): { amount: number; unit: OtherUnit; when: string } {
  const known = FREE_TEXT_UNITS[item.unit.trim().toLowerCase()];
  if (known) return { amount: item.amount * known[1], unit: known[0], when: item.when };
  return { amount: item.amount, unit: 'each', when: [item.when.trim(), `(${item.unit.trim()})`].filter(Boolean).join(' ').slice(0, 60) };
}
