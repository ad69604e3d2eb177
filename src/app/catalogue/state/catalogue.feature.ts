import { createFeature, createReducer, createSelector, on } from '@ngrx/store';
import { Fermentable, Hop, IngredientCatalogue, IngredientKind, OtherAddition, Yeast } from '@shared/recipes';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { CatalogueEntry } from '../catalogue-entry';
import { CatalogueApiActions } from './catalogue-api.actions';
import { CataloguePageActions } from './catalogue-page.actions';
import {
  CatalogueState,
  fermentablesAdapter,
  hopsAdapter,
  initialCatalogueState,
  othersAdapter,
  stylesAdapter,
  yeastsAdapter,
} from './catalogue.state';

export * from './catalogue.state';

function withCatalogue(state: CatalogueState, catalogue: IngredientCatalogue): CatalogueState {
  return {
    ...state,
    fermentables: fermentablesAdapter.setAll(catalogue.fermentables, state.fermentables),
    hops: hopsAdapter.setAll(catalogue.hops, state.hops),
    yeasts: yeastsAdapter.setAll(catalogue.yeasts, state.yeasts),
    others: othersAdapter.setAll(catalogue.others, state.others),
  };
}

function withEntry(state: CatalogueState, kind: IngredientKind, entry: CatalogueEntry): CatalogueState {
  switch (kind) {
    case 'fermentables':
      return { ...state, fermentables: fermentablesAdapter.setOne(entry as Fermentable, state.fermentables) };
    case 'hops':
      return { ...state, hops: hopsAdapter.setOne(entry as Hop, state.hops) };
    case 'yeasts':
      return { ...state, yeasts: yeastsAdapter.setOne(entry as Yeast, state.yeasts) };
    default:
      return { ...state, others: othersAdapter.setOne(entry as OtherAddition, state.others) };
  }
}

export const catalogueFeature = createFeature({
  name: 'catalogue',
  reducer: createReducer(
    initialCatalogueState,
    on(CataloguePageActions.opened, (state): CatalogueState => ({ ...state, loading: true, loadError: null })),
    on(CataloguePageActions.includeRetiredChanged, (state, { includeRetired }): CatalogueState => ({ ...state, includeRetired })),
    on(CataloguePageActions.searchChanged, (state, { search }): CatalogueState => ({ ...state, search })),
    on(CatalogueApiActions.catalogueLoadedSuccess, (state, { catalogue }): CatalogueState =>
      withCatalogue({ ...state, loaded: true, loading: false }, catalogue),
    ),
    on(CatalogueApiActions.catalogueLoadedFailure, (state, { message }): CatalogueState => ({ ...state, loading: false, loadError: message })),
    on(CatalogueApiActions.stylesLoadedSuccess, (state, { styles }): CatalogueState => ({ ...state, styles: stylesAdapter.setAll(styles, state.styles) })),
    on(CatalogueApiActions.brewhouseLoadedSuccess, CatalogueApiActions.brewhouseSavedSuccess, (state, { settings }): CatalogueState => ({
      ...state,
      brewhouse: settings,
      saving: false,
    })),
    on(
      CataloguePageActions.entryAdded,
      CataloguePageActions.entryChanged,
      CataloguePageActions.entryRetiredChanged,
      CataloguePageActions.styleAdded,
      CataloguePageActions.styleChanged,
      CataloguePageActions.brewhouseSaved,
      (state): CatalogueState => ({ ...state, saving: true }),
    ),
    on(CatalogueApiActions.entrySavedSuccess, (state, { kind, entry }): CatalogueState =>
      withEntry(
        { ...state, saving: false, savedCount: state.savedCount + 1, usagePanel: state.usagePanel?.id === entry.id && state.usagePanel.kind === kind ? null : state.usagePanel },
        kind,
        entry,
      ),
    ),
    on(CatalogueApiActions.styleSavedSuccess, (state, { style }): CatalogueState => ({
      ...state,
      saving: false,
      savedCount: state.savedCount + 1,
      styles: stylesAdapter.setOne(style, state.styles),
    })),
    on(
      CatalogueApiActions.entrySavedFailure,
      CatalogueApiActions.styleSavedFailure,
      CatalogueApiActions.brewhouseSavedFailure,
      (state): CatalogueState => ({ ...state, saving: false }),
    ),
    on(CataloguePageActions.importPreviewRequested, CataloguePageActions.importConfirmed, (state): CatalogueState => ({ ...state, importing: true })),
    on(CatalogueApiActions.importPreviewedSuccess, (state, { csv, result }): CatalogueState => ({
      ...state,
      importing: false,
      importPreview: { kind: result.kind, csv, result },
    })),
    on(CatalogueApiActions.importCommittedSuccess, (state, { result }): CatalogueState => ({
      ...state,
      importing: false,
      // A refused file stays on screen with its problems; an imported one is done with.
      importPreview: result.problems.length === 0 ? null : state.importPreview && { ...state.importPreview, result },
    })),
    on(CatalogueApiActions.importPreviewedFailure, CatalogueApiActions.importCommittedFailure, (state): CatalogueState => ({ ...state, importing: false })),
    on(CataloguePageActions.importDismissed, (state): CatalogueState => ({ ...state, importPreview: null })),
    on(CataloguePageActions.usageRequested, (state, { kind, id, name, purpose }): CatalogueState => ({
      ...state,
      usagePanel: { kind, id, name, purpose, usage: null, error: null },
    })),
    on(CatalogueApiActions.usageLoadedSuccess, (state, { id, usage }): CatalogueState =>
      state.usagePanel?.id === id ? { ...state, usagePanel: { ...state.usagePanel, usage } } : state,
    ),
    on(CatalogueApiActions.usageLoadedFailure, (state, { id, message }): CatalogueState =>
      state.usagePanel?.id === id ? { ...state, usagePanel: { ...state.usagePanel, error: message } } : state,
    ),
    on(CataloguePageActions.usageDismissed, (state): CatalogueState => ({ ...state, usagePanel: null })),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (): CatalogueState => initialCatalogueState),
  ),
  extraSelectors: ({ selectFermentables, selectHops, selectYeasts, selectOthers, selectStyles }) => ({
    selectAllFermentables: createSelector(selectFermentables, fermentablesAdapter.getSelectors().selectAll),
    selectAllHops: createSelector(selectHops, hopsAdapter.getSelectors().selectAll),
    selectAllYeasts: createSelector(selectYeasts, yeastsAdapter.getSelectors().selectAll),
    selectAllOthers: createSelector(selectOthers, othersAdapter.getSelectors().selectAll),
    selectAllStyles: createSelector(selectStyles, stylesAdapter.getSelectors().selectAll),
  }),
});
