import { INGREDIENT_KINDS, IngredientCatalogue, RecipePrediction, RecipeVersion, UnitSystem } from '@shared/recipes';
import { DesignDifference, designDifferences } from './design-differences';

// Figures as the comparison shows them; a figure is changed only when its shown text differs,
// so 6.3 against 6.3 is never marked.
const FIGURES: { label: string; digits: number; of: (p: RecipePrediction) => number | null }[] = [
  { label: 'OG', digits: 3, of: (p) => p.og },
  { label: 'FG', digits: 3, of: (p) => p.fg },
  { label: 'ABV density-based (%)', digits: 1, of: (p) => p.abvDensityBased },
  { label: 'IBU', digits: 0, of: (p) => p.ibu },
  { label: 'Colour (SRM)', digits: 1, of: (p) => p.colourSrm },
];

const shown = (value: number | null, digits: number) => (value === null ? '–' : value.toFixed(digits));

/** The predicted figures of two versions as comparison lines. */
export function predictionDifferences(left: RecipePrediction, right: RecipePrediction): DesignDifference[] {
  return FIGURES.map(({ label, digits, of }) => {
    const [l, r] = [shown(of(left), digits), shown(of(right), digits)];
    return { section: 'Predictions', label, left: l, right: r, changed: l !== r };
  });
}

type Entry = Record<string, unknown> & { id: number; name: string };
const PROPERTY_TEXT: Record<string, (e: Entry) => string> = {
  fermentables: (e) => `${e['kind']}, extract ${e['extractPercent']} %, ${e['colourLovibond']} °L`,
  hops: (e) => `${e['form']}, alpha acid ${e['alphaAcidPercent']} %`,
  yeasts: (e) => `attenuation ${e['attenuationMinPercent']}–${e['attenuationMaxPercent']} %`,
  others: (e) => `${e['kind']}`,
};

/** Ingredient properties the two versions were saved with differently (an update to the catalogue's values), one line each. */
export function ingredientValueDifferences(left: IngredientCatalogue, right: IngredientCatalogue): DesignDifference[] {
  return INGREDIENT_KINDS.flatMap((kind) => {
    const a = left[kind] as unknown as Entry[];
    const b = right[kind] as unknown as Entry[];
    const ids = [...new Set([...a, ...b].map((entry) => entry.id))];
    return ids.map((id) => {
      const [l, r] = [a.find((e) => e.id === id), b.find((e) => e.id === id)];
      const [lt, rt] = [l ? PROPERTY_TEXT[kind](l) : '—', r ? PROPERTY_TEXT[kind](r) : '—'];
      return { section: 'Ingredient values', label: (l ?? r)!.name, left: lt, right: rt, changed: lt !== rt };
    });
  }).filter((row) => row.changed);
}

/** Every line of a comparison of two saved versions, each read from its own snapshot. */
export function versionDifferences(
  left: RecipeVersion,
  right: RecipeVersion,
  predictions: readonly [RecipePrediction, RecipePrediction],
  system: UnitSystem,
): DesignDifference[] {
  return [
    ...predictionDifferences(predictions[0], predictions[1]),
    ...designDifferences(left.design, right.design, left.ingredients, system, right.ingredients),
    ...ingredientValueDifferences(left.ingredients, right.ingredients),
  ];
}
