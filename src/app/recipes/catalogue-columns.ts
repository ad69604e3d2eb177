import { IngredientKind } from '@shared/recipes';

/** The columns a catalogue CSV file names in its first line, per kind (the API's field names). */
export const CATALOGUE_CSV_COLUMNS: Record<IngredientKind, readonly string[]> = {
  fermentables: ['name', 'kind', 'extractPercent', 'colourLovibond', 'maxSharePercent'],
  hops: ['name', 'alphaAcidPercent', 'form'],
  yeasts: ['name', 'attenuationMinPercent', 'attenuationMaxPercent', 'temperatureMinC', 'temperatureMaxC', 'flocculation'],
  others: ['name', 'kind'],
};

/** Headings of each kind's tab and table. */
export const KIND_LABELS: Record<IngredientKind, { plural: string; singular: string }> = {
  fermentables: { plural: 'Fermentables', singular: 'fermentable' },
  hops: { plural: 'Hops', singular: 'hop' },
  yeasts: { plural: 'Yeasts', singular: 'yeast' },
  others: { plural: 'Other additions', singular: 'other addition' },
};
