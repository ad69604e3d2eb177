import { createEntityAdapter, EntityState } from '@ngrx/entity';
import { createFeature, createReducer, createSelector, on } from '@ngrx/store';
import {
  BrewhouseSettings,
  CatalogueImportResult,
  Fermentable,
  Hop,
  IngredientCatalogue,
  IngredientKind,
  OtherAddition,
  StyleTarget,
  Yeast,
} from '@shared/recipes';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { CatalogueEntry } from '../catalogue-entry';
import { CatalogueApiActions } from './catalogue-api.actions';
import { CataloguePageActions } from './catalogue-page.actions';

/** A CSV file being checked before it is imported. */
export interface ImportPreview {
  kind: IngredientKind;
  csv: string;
  result: CatalogueImportResult;
}

export interface CatalogueState {
  fermentables: EntityState<Fermentable>;
  hops: EntityState<Hop>;
  yeasts: EntityState<Yeast>;
  others: EntityState<OtherAddition>;
  styles: EntityState<StyleTarget>;
  /** Null until the server has answered. */
  brewhouse: BrewhouseSettings | null;
  includeRetired: boolean;
  search: string;
  loaded: boolean;
  loading: boolean;
  loadError: string | null;
  saving: boolean;
  /** Counts saved entries so entry forms can clear after each one. */
  savedCount: number;
  importPreview: ImportPreview | null;
  importing: boolean;
}

const byName = <T extends { name: string }>(a: T, b: T) => a.name.localeCompare(b.name);
export const fermentablesAdapter = createEntityAdapter<Fermentable>({ sortComparer: byName });
export const hopsAdapter = createEntityAdapter<Hop>({ sortComparer: byName });
export const yeastsAdapter = createEntityAdapter<Yeast>({ sortComparer: byName });
export const othersAdapter = createEntityAdapter<OtherAddition>({ sortComparer: byName });
export const stylesAdapter = createEntityAdapter<StyleTarget>({ sortComparer: byName });

export const initialCatalogueState: CatalogueState = {
  fermentables: fermentablesAdapter.getInitialState(),
  hops: hopsAdapter.getInitialState(),
  yeasts: yeastsAdapter.getInitialState(),
  others: othersAdapter.getInitialState(),
  styles: stylesAdapter.getInitialState(),
  brewhouse: null,
  includeRetired: false,
  search: '',
  loaded: false,
  loading: false,
  loadError: null,
  saving: false,
  savedCount: 0,
  importPreview: null,
  importing: false,
};

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
      withEntry({ ...state, saving: false, savedCount: state.savedCount + 1 }, kind, entry),
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
      importPreview: result.imported > 0 || result.problems.length === 0 ? null : state.importPreview && { ...state.importPreview, result },
    })),
    on(CatalogueApiActions.importPreviewedFailure, CatalogueApiActions.importCommittedFailure, (state): CatalogueState => ({ ...state, importing: false })),
    on(CataloguePageActions.importDismissed, (state): CatalogueState => ({ ...state, importPreview: null })),
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
