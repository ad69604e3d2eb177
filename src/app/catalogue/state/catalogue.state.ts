import { createEntityAdapter, EntityState } from '@ngrx/entity';
import { BrewhouseSettings, CatalogueImportResult, Fermentable, Hop, IngredientKind, IngredientUsage, OtherAddition, StyleTarget, Yeast } from '@shared/recipes';

/** The "used in" panel of one entry; `usage` is null while it loads. */
export interface UsagePanel {
  kind: IngredientKind;
  id: number;
  name: string;
  purpose: 'view' | 'retire';
  usage: IngredientUsage | null;
  error: string | null;
}

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
  usagePanel: UsagePanel | null;
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
  usagePanel: null,
};

