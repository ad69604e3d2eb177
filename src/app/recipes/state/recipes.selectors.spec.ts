import { generateMockCatalogue, generateMockDesign, MOCK_BREWHOUSE, predictRecipe, StyleTarget } from '@shared/recipes';
import { generateMockRecipe } from '@app/testing/recipe-mock';
import { CatalogueApiActions } from '@app/catalogue/state/catalogue-api.actions';
import { catalogueFeature, initialCatalogueState } from '@app/catalogue/state/catalogue.feature';
import { RecipeEditorPageActions } from './recipe-editor-page.actions';
import { RecipesApiActions } from './recipes-api.actions';
import { initialRecipesState, recipesFeature } from './recipes.feature';
import { selectEditorPrediction, selectEditorStyleComparison, selectRecipeListViewModel } from './recipes.selectors';

const catalogue = generateMockCatalogue();
const style: StyleTarget = {
  id: 5,
  name: 'Co-op pale',
  og: { min: 1.04, max: 1.06 },
  fg: { min: 1.008, max: 1.014 },
  abv: { min: 4, max: 6 },
  ibu: { min: 20, max: 40 },
  colourSrm: { min: 4, max: 10 },
};

function stateWith(design = generateMockDesign({ styleId: 5 })) {
  let catalogueState = catalogueFeature.reducer(initialCatalogueState, CatalogueApiActions.catalogueLoadedSuccess({ catalogue }));
  catalogueState = catalogueFeature.reducer(catalogueState, CatalogueApiActions.brewhouseLoadedSuccess({ settings: MOCK_BREWHOUSE }));
  catalogueState = catalogueFeature.reducer(catalogueState, CatalogueApiActions.stylesLoadedSuccess({ styles: [style] }));
  const recipes = recipesFeature.reducer(initialRecipesState, RecipeEditorPageActions.designChanged({ design }));
  return { recipes, catalogue: catalogueState };
}

describe('recipes selectors', () => {
  it('selectEditorPrediction is predictRecipe of the typed design with the loaded catalogue and brewhouse', () => {
    const design = generateMockDesign({ styleId: 5 });

    expect(selectEditorPrediction(stateWith(design))).toEqual(predictRecipe(design, catalogue, MOCK_BREWHOUSE));
  });

  it('selectEditorStyleComparison sets the prediction against the chosen style', () => {
    const comparison = selectEditorStyleComparison(stateWith());

    expect(comparison.map((each) => each.key)).toEqual(['og', 'fg', 'abv', 'ibu', 'colourSrm']);
    expect(comparison.every((each) => each.range === style[each.key])).toBe(true);
  });

  it('selectRecipeListViewModel filters by name or owner and names the style', () => {
    const state = stateWith();
    const pale = generateMockRecipe({ id: 1, name: 'Porch pale', styleId: 5 });
    const stout = generateMockRecipe({ id: 2, name: 'Night stout', ownerName: 'Jonah Weiss', styleId: null });
    let recipes = recipesFeature.reducer(state.recipes, RecipesApiActions.recipesLoadedSuccess({ recipes: [pale, stout] }));
    recipes = { ...recipes, search: 'jonah' };

    const vm = selectRecipeListViewModel({ ...state, recipes });

    expect(vm.recipes.map((recipe) => [recipe.name, recipe.styleName])).toEqual([['Night stout', null]]);
  });
});
