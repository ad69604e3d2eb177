import { IngredientCatalogue, IngredientKind, OtherUnit, RecipeDesign } from '@shared/recipes';

/** One line of the index of what a version uses: amounts in kg, L or a count. */
export interface VersionItem {
  position: number;
  ingredientId: number;
  amount: number;
  amountUnit: 'kg' | 'L' | 'each';
  use: string;
}

const OTHER_SI: Record<OtherUnit, [number, VersionItem['amountUnit']]> = { g: [0.001, 'kg'], kg: [1, 'kg'], mL: [0.001, 'L'], L: [1, 'L'], each: [1, 'each'] };

/** The index lines of a design, with identities from the version's own snapshot. */
export function versionItems(design: RecipeDesign, ingredients: IngredientCatalogue): VersionItem[] {
  const identity = (kind: IngredientKind, id: number): number => {
    const entry = (ingredients[kind] as { id: number; ingredientId: number }[]).find((each) => each.id === id);
    if (!entry) throw new Error(`The snapshot lacks ${kind} entry ${id}.`);
    return entry.ingredientId;
  };
  const lines: Omit<VersionItem, 'position'>[] = [
    ...design.fermentables.map((item) => ({ ingredientId: identity('fermentables', item.fermentableId), amount: item.amountKg, amountUnit: 'kg' as const, use: 'fermentable' })),
    ...design.hops.map((item) => ({ ingredientId: identity('hops', item.hopId), amount: item.amountGrams / 1000, amountUnit: 'kg' as const, use: item.use })),
    ...(design.yeastId === null ? [] : [{ ingredientId: identity('yeasts', design.yeastId), amount: 1, amountUnit: 'each' as const, use: 'yeast' }]),
    ...design.others.map((item) => {
      const [factor, amountUnit] = OTHER_SI[item.unit];
      return { ingredientId: identity('others', item.otherId), amount: item.amount * factor, amountUnit, use: 'other' };
    }),
  ];
  return lines.map((line, position) => ({ ...line, position }));
}
