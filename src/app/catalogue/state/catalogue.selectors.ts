import { createSelector } from '@ngrx/store';
import { DEFAULT_BREWHOUSE_SETTINGS, IngredientCatalogue, IngredientKind } from '@shared/recipes';
import { authFeature } from '@app/auth/state/auth.feature';
import { CatalogueEntry } from '../catalogue-entry';
import { catalogueFeature } from './catalogue.feature';

/** The whole catalogue, retired entries included, as the prediction library reads it. */
export const selectCatalogue = createSelector(
  catalogueFeature.selectAllFermentables,
  catalogueFeature.selectAllHops,
  catalogueFeature.selectAllYeasts,
  catalogueFeature.selectAllOthers,
  (fermentables, hops, yeasts, others): IngredientCatalogue => ({ fermentables, hops, yeasts, others }),
);

/** The co-op's brewhouse, or the sensible defaults until it has answered. */
export const selectBrewhouseOrDefault = createSelector(catalogueFeature.selectBrewhouse, (settings) => settings ?? DEFAULT_BREWHOUSE_SETTINGS);

/** Brewers and admins keep the catalogue, the style list and the brewhouse settings. */
export const selectCanKeepCatalogue = createSelector(authFeature.selectRoles, (roles) => roles.includes('brewer') || roles.includes('admin'));

/** The catalogue page: each kind's entries, filtered by the retired toggle. */
export const selectCataloguePageViewModel = createSelector(
  selectCatalogue,
  catalogueFeature.selectCatalogueState,
  selectCanKeepCatalogue,
  catalogueFeature.selectAllStyles,
  (catalogue, state, canEdit, styles) => {
    const words = state.search.trim().toLowerCase();
    const shown = <T extends CatalogueEntry>(entries: T[]) =>
      entries.filter((entry) => (state.includeRetired || !entry.retired) && (!words || entry.name.toLowerCase().includes(words)));
    const entries: Record<IngredientKind, CatalogueEntry[]> = {
      fermentables: shown(catalogue.fermentables),
      hops: shown(catalogue.hops),
      yeasts: shown(catalogue.yeasts),
      others: shown(catalogue.others),
    };
    return {
      entries,
      styles,
      brewhouse: state.brewhouse,
      canEdit,
      includeRetired: state.includeRetired,
      search: state.search,
      loading: state.loading,
      loadError: state.loadError,
      saving: state.saving,
      savedCount: state.savedCount,
      importPreview: state.importPreview,
      importing: state.importing,
      usagePanel: state.usagePanel,
    };
  },
);
