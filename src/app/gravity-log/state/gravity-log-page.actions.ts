import { createActionGroup, props } from '@ngrx/store';
import { CorrectionFactorRequest } from '@shared/batches';
import { GravityReading, ImportMode, ReadingChangesRequest, ReadingColumnMapping, ReadingInput, ReadingSortColumn } from '@shared/readings';

export const GravityLogPageActions = createActionGroup({
  source: 'Gravity Log Page',
  events: {
    Opened: props<{ batchId: number }>(),
    'Page Changed': props<{ pageIndex: number; pageSize: number }>(),
    'Sort Changed': props<{ sort: ReadingSortColumn; direction: 'asc' | 'desc' }>(),
    'Reading Submitted': props<{ batchId: number; input: ReadingInput }>(),
    'Reading Edit Chosen': props<{ reading: GravityReading }>(),
    'Reading Edit Submitted': props<{ readingId: number; changes: ReadingChangesRequest }>(),
    'Reading Delete Chosen': props<{ reading: GravityReading }>(),
    'Reading Delete Confirmed': props<{ readingId: number }>(),
    'File Submitted': props<{ batchId: number; file: File; mode: ImportMode; dryRun: boolean; columns: ReadingColumnMapping }>(),
    'Correction Factor Submitted': props<{ batchId: number; request: CorrectionFactorRequest }>(),
    'Push Token Requested': props<{ batchId: number; label: string }>(),
    'Push Token Revoke Chosen': props<{ batchId: number; tokenId: number; label: string }>(),
    'Push Token Revoke Confirmed': props<{ batchId: number; tokenId: number }>(),
  },
});
