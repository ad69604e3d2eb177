import { IngredientKind } from '@shared/recipes';

export { CATALOGUE_CSV_COLUMNS } from '@shared/recipes';

/** Headings of each kind's tab and table. */
export const KIND_LABELS: Record<IngredientKind, { plural: string; singular: string }> = {
  fermentables: { plural: 'Fermentables', singular: 'fermentable' },
  hops: { plural: 'Hops', singular: 'hop' },
  yeasts: { plural: 'Yeasts', singular: 'yeast' },
  others: { plural: 'Other additions', singular: 'other addition' },
};
