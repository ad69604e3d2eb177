import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { BrewhouseSettings, ImportChoice, IngredientKind, StyleTargetInput } from '@shared/recipes';
import { CatalogueEntryInput } from '../catalogue-entry';

export const CataloguePageActions = createActionGroup({
  source: 'Catalogue Page',
  events: {
    Opened: emptyProps(),
    'Include Retired Changed': props<{ includeRetired: boolean }>(),
    'Search Changed': props<{ search: string }>(),
    'Entry Added': props<{ kind: IngredientKind; input: CatalogueEntryInput }>(),
    'Entry Changed': props<{ kind: IngredientKind; id: number; input: CatalogueEntryInput }>(),
    'Entry Retired Changed': props<{ kind: IngredientKind; id: number; retired: boolean }>(),
    'Import Preview Requested': props<{ kind: IngredientKind; csv: string }>(),
    'Import Confirmed': props<{ kind: IngredientKind; csv: string; choices: { line: number; choice: ImportChoice }[] }>(),
    'Import Dismissed': emptyProps(),
    'Usage Requested': props<{ kind: IngredientKind; id: number; name: string; purpose: 'view' | 'retire' }>(),
    'Usage Dismissed': emptyProps(),
    'Style Added': props<{ input: StyleTargetInput }>(),
    'Style Changed': props<{ styleId: number; input: StyleTargetInput }>(),
    'Brewhouse Saved': props<{ settings: BrewhouseSettings }>(),
  },
});
