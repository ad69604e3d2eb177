import { createSelector } from '@ngrx/store';
import { catalogueWithSnapshot, changesSinceSnapshot, compareToStyle, predictRecipe, sameDesign, shownAmountText } from '@shared/recipes';
import { emptyDesign } from '../view-models/recipe-form-model';
import { versionDifferences } from '../view-models/version-differences';
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

/**
 * The ingredient values the editor predicts with: those the open version was saved with, and
 * today's catalogue for anything added since.
 */
export const selectEditorCatalogue = createSelector(recipesFeature.selectCurrent, selectCatalogue, (current, catalogue) =>
  current ? catalogueWithSnapshot(current.ingredients, catalogue) : catalogue,
);

/** The brewhouse of the open version, or today's for a new recipe. */
export const selectEditorBrewhouse = createSelector(recipesFeature.selectCurrent, selectBrewhouseOrDefault, (current, brewhouse) => current?.brewhouse ?? brewhouse);

/** The predictions of what is typed, from the shared library. */
export const selectEditorPrediction = createSelector(recipesFeature.selectDraft, selectEditorCatalogue, selectEditorBrewhouse, (draft, catalogue, brewhouse) =>
  draft ? predictRecipe(draft, catalogue, brewhouse) : null,
);

/** True when what is typed differs from the open version (or nothing is saved yet). */
export const selectEditorHasEdits = createSelector(recipesFeature.selectDraft, recipesFeature.selectCurrent, (draft, current) =>
  current === null ? draft !== null : draft !== null && !sameDesign(draft, current.design),
);

/**
 * What today's catalogue and brewhouse hold differently from the open version: the owner may
 * update to them, as a new version. Empty until both have loaded.
 */
export const selectEditorCatalogueUpdate = createSelector(
  recipesFeature.selectCurrent,
  selectCatalogue,
  catalogueFeature.selectBrewhouse,
  catalogueFeature.selectLoaded,
  selectEditorHasEdits,
  (current, catalogue, brewhouse, loaded, hasEdits) => ({
    changes: current?.editable && !current.archived && loaded && brewhouse ? changesSinceSnapshot(current, catalogue, brewhouse) : [],
    blockedByEdits: hasEdits,
  }),
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
  selectEditorCatalogue,
  catalogueFeature.selectAllStyles,
  selectEditorBrewhouse,
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

/**
 * The versions page: the list and, once two are picked, their differences side by side. Each
 * version is predicted from its own snapshot, so later catalogue edits never move its figures.
 */
export const selectRecipeVersionsViewModel = createSelector(recipesFeature.selectRecipesState, (state) => {
  const pair = state.comparison;
  const predictionOf = (version: NonNullable<typeof pair>['left']) => predictRecipe(version.design, version.ingredients, version.brewhouse);
  return {
    recipe: state.current,
    versions: state.versions,
    comparing: state.comparing,
    comparison: pair && {
      left: pair.left,
      right: pair.right,
      rows: versionDifferences(pair.left, pair.right, [predictionOf(pair.left), predictionOf(pair.right)], state.unitSystem),
    },
  };
});

/** The brew-day sheet of the open recipe's saved version, from what that version was saved with. */
export const selectBrewDaySheetViewModel = createSelector(
  recipesFeature.selectCurrent,
  catalogueFeature.selectStyles,
  recipesFeature.selectUnitSystem,
  (recipe, styles, unitSystem) =>
    recipe
      ? brewDaySheet(recipe, recipe.ingredients, recipe.brewhouse, recipe.styleId === null ? null : (styles.entities[recipe.styleId] ?? null), unitSystem)
      : null,
);
