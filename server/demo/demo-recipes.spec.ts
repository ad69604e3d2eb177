import { compareToStyle, DEFAULT_BREWHOUSE_SETTINGS, IngredientCatalogue, predictRecipe, RecipeDesign, StyleTarget } from '@shared/recipes';
import { FERMENTABLES, HOPS, YEASTS } from '../../seeds/02_ingredient_catalogue';
import { STYLES } from '../../seeds/03_style_targets';
import { DEMO_RECIPES, DemoRecipe } from '../../seeds/04_demo_recipes';

// The seeds' catalogue with ids by position, as the database would number a fresh install.
const catalogue: IngredientCatalogue = {
  fermentables: FERMENTABLES.map(([name, kind, extractPercent, colourLovibond, maxSharePercent], index) => ({
    id: index + 1, ingredientId: 100 + index, name, kind, extractPercent, colourLovibond, maxSharePercent, retired: false,
  })),
  hops: HOPS.map(([name, alphaAcidPercent, form], index) => ({ id: index + 1, ingredientId: 200 + index, name, alphaAcidPercent, form, retired: false })),
  yeasts: YEASTS.map(([name, attenuationMinPercent, attenuationMaxPercent, temperatureMinC, temperatureMaxC, flocculation], index) => ({
    id: index + 1, ingredientId: 300 + index, name, attenuationMinPercent, attenuationMaxPercent, temperatureMinC, temperatureMaxC, flocculation, retired: false,
  })),
  others: [],
};

const idOf = (entries: readonly { id: number; name: string }[], name: string) => entries.find((entry) => entry.name === name)!.id;

function designOf(demo: DemoRecipe): RecipeDesign {
  return {
    ...demo.design,
    styleId: 1,
    fermentables: demo.fermentables.map(([name, amountKg]) => ({ fermentableId: idOf(catalogue.fermentables, name), amountKg })),
    hops: demo.hops.map(([name, amountGrams, time, use]) => ({ hopId: idOf(catalogue.hops, name), amountGrams, time, use })),
    yeastId: idOf(catalogue.yeasts, demo.yeast),
    others: [],
  };
}

function styleOf(name: string): StyleTarget {
  const { og, fg, abv, ibu, colour_srm: colour } = STYLES.find((style) => style.name === name)!;
  const range = ([min, max]: number[]) => ({ min, max });
  return { id: 1, name, og: range(og), fg: range(fg), abv: range(abv), ibu: range(ibu), colourSrm: range(colour) };
}

describe('demo recipes', () => {
  it.each(DEMO_RECIPES.map((demo) => [demo.design.name, demo] as const))('%s predicts every figure inside its own style', (_name, demo) => {
    const prediction = predictRecipe(designOf(demo), catalogue, DEFAULT_BREWHOUSE_SETTINGS);

    const outside = compareToStyle(prediction, styleOf(demo.style)).filter((each) => each.position !== 'within');

    expect(outside.map(({ label, value, range }) => `${label} ${value} not in ${range.min}–${range.max}`)).toEqual([]);
  });
});
