import { createEntityAdapter, EntityState } from '@ngrx/entity';
import { createFeature, createReducer, createSelector, on } from '@ngrx/store';
import { Recipe, RecipeDesign, RecipeSummary, RecipeVersion, RecipeVersionSummary, UnitSystem } from '@shared/recipes';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { BrewDaySheetPageActions } from './brew-day-sheet-page.actions';
import { RecipeEditorPageActions } from './recipe-editor-page.actions';
import { RecipeListPageActions } from './recipe-list-page.actions';
import { RecipeVersionsPageActions } from './recipe-versions-page.actions';
import { RecipeArchiveConfirmationActions } from './recipe-archive-confirmation.actions';
import { RecipesApiActions } from './recipes-api.actions';

export interface RecipesState extends EntityState<RecipeSummary> {
  includeArchived: boolean;
  search: string;
  listLoading: boolean;
  listError: string | null;
  /** The recipe open in the editor, versions page or brew-day sheet. */
  current: Recipe | null;
  currentLoading: boolean;
  currentError: string | null;
  /** The design as typed, when valid; predictions follow it. */
  draft: RecipeDesign | null;
  /** Goes up whenever the form must take a design from the store (opened, saved, scaled). */
  draftRevision: number;
  saving: boolean;
  versions: RecipeVersionSummary[];
  comparison: { left: RecipeVersion; right: RecipeVersion } | null;
  comparing: boolean;
  unitSystem: UnitSystem;
}

export const recipesAdapter = createEntityAdapter<RecipeSummary>({
  sortComparer: (a, b) => b.updatedAt.localeCompare(a.updatedAt),
});

export const initialRecipesState: RecipesState = recipesAdapter.getInitialState({
  includeArchived: false,
  search: '',
  listLoading: false,
  listError: null,
  current: null,
  currentLoading: false,
  currentError: null,
  draft: null,
  draftRevision: 0,
  saving: false,
  versions: [],
  comparison: null,
  comparing: false,
  unitSystem: 'metric',
});

const summaryOf = ({ design: _design, editable: _editable, createdAt: _createdAt, ...summary }: Recipe): RecipeSummary => summary;

function withCurrent(state: RecipesState, recipe: Recipe): RecipesState {
  return recipesAdapter.upsertOne(summaryOf(recipe), {
    ...state,
    current: recipe,
    currentLoading: false,
    saving: false,
    draft: recipe.design,
    draftRevision: state.draftRevision + 1,
  });
}

export const recipesFeature = createFeature({
  name: 'recipes',
  reducer: createReducer(
    initialRecipesState,
    on(RecipeListPageActions.opened, (state): RecipesState => ({ ...state, listLoading: true, listError: null })),
    on(RecipeListPageActions.includeArchivedChanged, (state, { includeArchived }): RecipesState => ({ ...state, includeArchived, listLoading: true })),
    on(RecipeListPageActions.searchChanged, (state, { search }): RecipesState => ({ ...state, search })),
    on(RecipesApiActions.recipesLoadedSuccess, (state, { recipes }): RecipesState =>
      recipesAdapter.setAll(recipes, { ...state, listLoading: false }),
    ),
    on(RecipesApiActions.recipesLoadedFailure, (state, { message }): RecipesState => ({ ...state, listLoading: false, listError: message })),
    on(RecipeEditorPageActions.newOpened, (state): RecipesState => ({
      ...state,
      current: null,
      currentError: null,
      draft: null,
      draftRevision: state.draftRevision + 1,
    })),
    on(RecipeEditorPageActions.existingOpened, BrewDaySheetPageActions.opened, RecipeVersionsPageActions.opened, (state, { recipeId }): RecipesState => ({
      ...state,
      current: state.current?.id === recipeId ? state.current : null,
      draft: state.current?.id === recipeId ? state.draft : null,
      currentLoading: true,
      currentError: null,
    })),
    on(RecipesApiActions.recipeLoadedSuccess, RecipesApiActions.recipeCreatedSuccess, RecipesApiActions.recipeSavedSuccess,
      RecipesApiActions.recipeUpdatedSuccess, RecipesApiActions.recipeClonedSuccess, RecipesApiActions.recipeImportedSuccess,
      RecipesApiActions.recipeUpdatedToCatalogueSuccess, (state, { recipe }): RecipesState => withCurrent(state, recipe)),
    on(RecipesApiActions.recipeLoadedFailure, (state, { message }): RecipesState => ({ ...state, currentLoading: false, currentError: message })),
    on(RecipeEditorPageActions.designChanged, (state, { design }): RecipesState => ({ ...state, draft: design })),
    on(RecipeEditorPageActions.designScaled, (state, { design }): RecipesState => ({
      ...state,
      draft: design,
      draftRevision: state.draftRevision + 1,
    })),
    on(RecipeEditorPageActions.saveSubmitted, RecipeEditorPageActions.visibilityChanged, RecipeArchiveConfirmationActions.archiveConfirmed,
      RecipeEditorPageActions.cloneRequested, (state): RecipesState => ({ ...state, saving: true })),
    on(RecipeEditorPageActions.catalogueUpdateRequested, (state): RecipesState => ({ ...state, saving: true })),
    on(RecipesApiActions.recipeSavedFailure, RecipesApiActions.recipeUpdatedFailure, RecipesApiActions.recipeClonedFailure,
      RecipesApiActions.recipeSaveUnchanged, RecipesApiActions.recipeUpdatedToCatalogueFailure, (state): RecipesState => ({ ...state, saving: false })),
    on(RecipesApiActions.versionsLoadedSuccess, (state, { versions }): RecipesState => ({ ...state, versions, comparison: null })),
    on(RecipeVersionsPageActions.versionsPicked, (state): RecipesState => ({ ...state, comparing: true })),
    on(RecipesApiActions.versionPairLoadedSuccess, (state, { left, right }): RecipesState => ({ ...state, comparing: false, comparison: { left, right } })),
    on(RecipesApiActions.versionPairLoadedFailure, (state): RecipesState => ({ ...state, comparing: false })),
    on(RecipesApiActions.preferencesLoadedSuccess, RecipesApiActions.preferencesSavedSuccess, (state, { preferences }): RecipesState => ({
      ...state,
      unitSystem: preferences.unitSystem,
    })),
    on(RecipeEditorPageActions.unitSystemChanged, (state, { unitSystem }): RecipesState => ({ ...state, unitSystem })),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (): RecipesState => initialRecipesState),
  ),
  extraSelectors: ({ selectRecipesState }) => ({
    selectAllRecipes: createSelector(selectRecipesState, recipesAdapter.getSelectors().selectAll),
  }),
});
