import { createActionGroup, props } from '@ngrx/store';
import { BrewhouseSettings, CatalogueImportResult, IngredientCatalogue, IngredientKind, IngredientUsage, StyleTarget } from '@shared/recipes';
import { CatalogueEntry } from '../catalogue-entry';

export const CatalogueApiActions = createActionGroup({
  source: 'Catalogue API',
  events: {
    'Catalogue Loaded Success': props<{ catalogue: IngredientCatalogue }>(),
    'Catalogue Loaded Failure': props<{ message: string }>(),
    'Styles Loaded Success': props<{ styles: StyleTarget[] }>(),
    'Styles Loaded Failure': props<{ message: string }>(),
    'Brewhouse Loaded Success': props<{ settings: BrewhouseSettings }>(),
    'Brewhouse Loaded Failure': props<{ message: string }>(),
    'Entry Saved Success': props<{ kind: IngredientKind; entry: CatalogueEntry }>(),
    'Entry Saved Failure': props<{ message: string }>(),
    'Import Previewed Success': props<{ csv: string; result: CatalogueImportResult }>(),
    'Import Previewed Failure': props<{ message: string }>(),
    'Import Committed Success': props<{ result: CatalogueImportResult }>(),
    'Import Committed Failure': props<{ message: string }>(),
    'Usage Loaded Success': props<{ id: number; usage: IngredientUsage }>(),
    'Usage Loaded Failure': props<{ id: number; message: string }>(),
    'Style Saved Success': props<{ style: StyleTarget }>(),
    'Style Saved Failure': props<{ message: string }>(),
    'Brewhouse Saved Success': props<{ settings: BrewhouseSettings }>(),
    'Brewhouse Saved Failure': props<{ message: string }>(),
  },
});
