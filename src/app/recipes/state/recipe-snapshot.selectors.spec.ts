import { generateMockCatalogue, generateMockDesign, IngredientCatalogue, MOCK_BREWHOUSE, predictRecipe } from '@shared/recipes';
import { generateMockRecipe, generateMockVersion } from '@app/testing/recipe-mock';
import { CatalogueApiActions } from '@app/catalogue/state/catalogue-api.actions';
import { catalogueFeature, initialCatalogueState } from '@app/catalogue/state/catalogue.feature';
import { RecipesApiActions } from './recipes-api.actions';
import { initialRecipesState, recipesFeature } from './recipes.feature';
import { selectEditorCatalogueUpdate, selectEditorPrediction, selectRecipeVersionsViewModel } from './recipes.selectors';

const saved = generateMockCatalogue();
/** Today's catalogue after a brewer raised the bittering hop's alpha acid from 12 % to 15 %. */
const edited: IngredientCatalogue = { ...saved, hops: saved.hops.map((hop) => (hop.id === 11 ? { ...hop, alphaAcidPercent: 15 } : hop)) };

function stateWith(catalogue: IngredientCatalogue) {
  let catalogueState = catalogueFeature.reducer(initialCatalogueState, CatalogueApiActions.catalogueLoadedSuccess({ catalogue }));
  catalogueState = catalogueFeature.reducer(catalogueState, CatalogueApiActions.brewhouseLoadedSuccess({ settings: MOCK_BREWHOUSE }));
  let recipes = recipesFeature.reducer(initialRecipesState, RecipesApiActions.recipeLoadedSuccess({ recipe: generateMockRecipe({ version: 2 }) }));
  const left = generateMockVersion(1);
  const right = generateMockVersion(2, { design: generateMockDesign({ batchVolumeLitres: 22 }) });
  recipes = recipesFeature.reducer(recipes, RecipesApiActions.versionPairLoadedSuccess({ left, right }));
  return { recipes, catalogue: catalogueState };
}

describe('recipe selectors with saved snapshots', () => {
  it("when a catalogue hop's alpha acid is edited, then the open version's figures and the comparison stay as saved", () => {
    const before = stateWith(saved);
    const after = stateWith(edited);

    expect(selectEditorPrediction(after)).toEqual(selectEditorPrediction(before));
    expect(selectEditorPrediction(after)).toEqual(predictRecipe(generateMockDesign(), saved, MOCK_BREWHOUSE));
    expect(selectRecipeVersionsViewModel(after).comparison!.rows).toEqual(selectRecipeVersionsViewModel(before).comparison!.rows);
  });

  it("when a catalogue hop's alpha acid is edited, then the editor offers the update with the old and new value", () => {
    expect(selectEditorCatalogueUpdate(stateWith(saved)).changes).toEqual([]);

    const offer = selectEditorCatalogueUpdate(stateWith(edited));

    expect(offer.changes).toEqual([{ source: 'hops', name: 'Bittering pellet hop', field: 'alphaAcidPercent', was: 12, now: 15 }]);
    expect(offer.blockedByEdits).toBe(false);
  });

  it('when someone else owns the open recipe, then no update is offered', () => {
    const state = stateWith(edited);
    const recipes = recipesFeature.reducer(state.recipes, RecipesApiActions.recipeLoadedSuccess({ recipe: generateMockRecipe({ editable: false }) }));

    expect(selectEditorCatalogueUpdate({ ...state, recipes }).changes).toEqual([]);
  });
});
