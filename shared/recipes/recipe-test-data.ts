import { DEFAULT_BREWHOUSE_SETTINGS } from './brewhouse-settings';
import { IngredientCatalogue } from './ingredient';
import { RecipeDesign } from './recipe-design';

/** An invented catalogue with generic names, for specs on both sides. */
export function generateMockCatalogue(): IngredientCatalogue {
  return {
    fermentables: [
      { id: 1, ingredientId: 101, name: 'Pale base malt', kind: 'grain', extractPercent: 80, colourLovibond: 3, maxSharePercent: 100, retired: false },
      { id: 2, ingredientId: 102, name: 'Medium crystal malt', kind: 'grain', extractPercent: 74, colourLovibond: 60, maxSharePercent: 15, retired: false },
      { id: 3, ingredientId: 103, name: 'Cane sugar', kind: 'sugar', extractPercent: 100, colourLovibond: 0, maxSharePercent: 20, retired: false },
      { id: 4, ingredientId: 104, name: 'Old roasted barley', kind: 'grain', extractPercent: 55, colourLovibond: 500, maxSharePercent: 10, retired: true },
    ],
    hops: [
      { id: 11, ingredientId: 111, name: 'Bittering pellet hop', alphaAcidPercent: 12, form: 'pellet', retired: false },
      { id: 12, ingredientId: 112, name: 'Aroma whole hop', alphaAcidPercent: 4.5, form: 'whole', retired: false },
    ],
    yeasts: [
      { id: 21, ingredientId: 121, name: 'Clean ale yeast', attenuationMinPercent: 73, attenuationMaxPercent: 77, temperatureMinC: 16, temperatureMaxC: 22, flocculation: 'medium', retired: false },
    ],
    others: [{ id: 31, ingredientId: 131, name: 'Kettle fining tablet', kind: 'fining', retired: false }],
  };
}

/** An invented pale ale design of 20 L, for specs. */
export function generateMockDesign(overrides: Partial<RecipeDesign> = {}): RecipeDesign {
  return {
    name: 'Fernhollow pale',
    styleId: null,
    batchVolumeLitres: 20,
    mashEfficiencyPercent: 72,
    boilMinutes: 60,
    fermentables: [
      { fermentableId: 1, amountKg: 4.2 },
      { fermentableId: 2, amountKg: 0.3 },
    ],
    hops: [
      { hopId: 11, amountGrams: 20, time: 60, use: 'boil' },
      { hopId: 12, amountGrams: 30, time: 10, use: 'boil' },
      { hopId: 12, amountGrams: 40, time: 3, use: 'dry hop' },
    ],
    yeastId: 21,
    others: [{ otherId: 31, amount: 1, unit: 'each', when: 'boil 10 min' }],
    mashSteps: [{ name: 'Saccharification rest', temperatureC: 66, minutes: 60 }],
    notes: '',
    ...overrides,
  };
}

export const MOCK_BREWHOUSE = DEFAULT_BREWHOUSE_SETTINGS;
