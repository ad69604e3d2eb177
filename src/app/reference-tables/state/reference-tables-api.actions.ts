import { createActionGroup, props } from '@ngrx/store';
import { ReferenceTableDetail, ReferenceTableList } from '@shared/reference-tables';

export const ReferenceTablesApiActions = createActionGroup({
  source: 'Reference Tables API',
  events: {
    'List Loaded Success': props<{ list: ReferenceTableList }>(),
    'List Loaded Failure': props<{ message: string }>(),
    'Table Uploaded Success': props<{ table: ReferenceTableDetail }>(),
    'Table Uploaded Failure': props<{ message: string; fields: Record<string, string> | null }>(),
    'Table Loaded Success': props<{ table: ReferenceTableDetail }>(),
    'Table Loaded Failure': props<{ message: string }>(),
    'Row Corrected Success': props<{ table: ReferenceTableDetail }>(),
    'Row Corrected Failure': props<{ message: string }>(),
    'Lab Table Chosen Success': props<{ list: ReferenceTableList }>(),
    'Lab Table Chosen Failure': props<{ message: string }>(),
  },
});
