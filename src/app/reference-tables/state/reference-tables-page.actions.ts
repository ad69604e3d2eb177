import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { TableUpload } from '../reference-tables-client';

export const ReferenceTablesPageActions = createActionGroup({
  source: 'Reference Tables Page',
  events: {
    Opened: emptyProps(),
    'Upload Submitted': props<{ upload: TableUpload }>(),
    'Lab Table Chosen': props<{ tableId: number | null }>(),
  },
});
