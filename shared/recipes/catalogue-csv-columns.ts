import { IngredientKind } from './ingredient';

/** The columns a catalogue CSV file names in its first line, per kind (the API's field names). */
export const CATALOGUE_CSV_COLUMNS: Record<IngredientKind, readonly string[]> = {
  fermentables: ['name', 'kind', 'extractPercent', 'colourLovibond', 'maxSharePercent'],
  hops: ['name', 'alphaAcidPercent', 'form'],
  yeasts: ['name', 'attenuationMinPercent', 'attenuationMaxPercent', 'temperatureMinC', 'temperatureMaxC', 'flocculation'],
  others: ['name', 'kind'],
};
