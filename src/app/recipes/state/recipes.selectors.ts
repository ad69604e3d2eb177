import { createSelector } from '@ngrx/store';
import { compareToStyle, predictRecipe, shownAmountText } from '@shared/recipes';
import { emptyDesign } from '../view-models/recipe-form-model';
import { designDifferences } from '../view-models/design-differences';
import { brewDaySheet } from '../view-models/brew-day-sheet-model';
import { catalogueFeature } from '@app/catalogue/state/catalogue.feature';
import { selectBrewhouseOrDefault, selectCatalogue } from '@app/catalogue/state/catalogue.selectors';
import { recipesFeature } from './recipes.feature';

/** The recipe list, filtered by the search text, with style names. */
export const selectRecipeListViewModel = createSelector(
  recipesFeature.selectAllRecipes,
  recipesFeature.selectSearch,
  recipesFeature.selectIncludeArchived,
  recipesFeature.selectListLoading,
  recipesFeature.selectListError,
  catalogueFeature.selectStyles,
  recipesFeature.selectUnitSystem,
  (recipes, search, includeArchived, loading, error, styles, unitSystem) => {
    const words = search.trim().toLowerCase();
    return {
      recipes: recipes
        .filter((recipe) => !words || `${recipe.name} ${recipe.ownerName}`.toLowerCase().includes(words))
        .map((recipe) => ({
          ...recipe,
          styleName: recipe.styleId === null ? null : (styles.entities[recipe.styleId]?.name ?? null),
          batchVolume: shownAmountText('volume', recipe.batchVolumeLitres, unitSystem),
        })),
      search,
      includeArchived,
      loading,
      error,
    };
  },
);

/** The design the editor shows: what is typed, else the open recipe's, else a fresh one. */
export const selectEditorDesign = createSelector(recipesFeature.selectDraft, recipesFeature.selectCurrent, (draft, current) => draft ?? current?.design ?? emptyDesign());

/** The predictions of what is typed, from the shared library. */
export const selectEditorPrediction = createSelector(recipesFeature.selectDraft, selectCatalogue, selectBrewhouseOrDefault, (draft, catalogue, brewhouse) =>
  draft ? predictRecipe(draft, catalogue, brewhouse) : null,
);

export const selectEditorStyle = createSelector(selectEditorDesign, catalogueFeature.selectStyles, (design, styles) =>
  design.styleId === null ? null : (styles.entities[design.styleId] ?? null),
);

export const selectEditorStyleComparison = createSelector(selectEditorPrediction, selectEditorStyle, (prediction, style) =>
  prediction && style ? compareToStyle(prediction, style) : [],
);

/** Everything the editor page shows. */
export const selectRecipeEditorViewModel = createSelector(
  recipesFeature.selectRecipesState,
  selectEditorDesign,
  selectCatalogue,
  catalogueFeature.selectAllStyles,
  selectBrewhouseOrDefault,
  (state, design, catalogue, styles, brewhouse) => ({
    recipe: state.current,
    design,
    revision: state.draftRevision,
    editable: state.current?.editable ?? true,
    catalogue,
    styles,
    brewhouse,
    unitSystem: state.unitSystem,
    saving: state.saving,
    loading: state.currentLoading,
    error: state.currentError,
  }),
);

/** The versions page: the list and, once two are picked, their differences and predictions side by side. */
export const selectRecipeVersionsViewModel = createSelector(
  recipesFeature.selectRecipesState,
  selectCatalogue,
  selectBrewhouseOrDefault,
  (state, catalogue, brewhouse) => {
    const pair = state.comparison;
    return {
      recipe: state.current,
      versions: state.versions,
      comparing: state.comparing,
      comparison: pair && {
        left: pair.left,
        right: pair.right,
        rows: designDifferences(pair.left.design, pair.right.design, catalogue, state.unitSystem),
        predictions: [predictRecipe(pair.left.design, catalogue, brewhouse), predictRecipe(pair.right.design, catalogue, brewhouse)] as const,
      },
    };
  },
);

/** The brew-day sheet of the open recipe. */
export const selectBrewDaySheetViewModel = createSelector(
  recipesFeature.selectCurrent,
  selectCatalogue,
  selectBrewhouseOrDefault,
  catalogueFeature.selectStyles,
  recipesFeature.selectUnitSystem,
  (recipe, catalogue, brewhouse, styles, unitSystem) =>
    recipe ? brewDaySheet(recipe, catalogue, brewhouse, recipe.styleId === null ? null : (styles.entities[recipe.styleId] ?? null), unitSystem) : null,
);
