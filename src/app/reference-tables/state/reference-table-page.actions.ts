import { createActionGroup, props } from '@ngrx/store';
import { RowCorrectionRequest } from '@shared/reference-tables';

export const ReferenceTablePageActions = createActionGroup({
  source: 'Reference Table Page',
  events: {
    Opened: props<{ tableId: number }>(),
    'Row Corrected': props<{ tableId: number; rowId: number; correction: RowCorrectionRequest }>(),
    'Lab Table Chosen': props<{ tableId: number | null }>(),
  },
});
