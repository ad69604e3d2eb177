import { createActionGroup, props } from '@ngrx/store';
import { Batch } from '@shared/batches';
import { GravityReading, IssuedPushToken, PushTokenSummary, ReadingImportResult } from '@shared/readings';
import { LoadedReadingPage } from '../readings-client';

export const ReadingsApiActions = createActionGroup({
  source: 'Readings API',
  events: {
    'Batch Loaded Success': props<{ batch: Batch }>(),
    'Batch Loaded Failure': props<{ message: string }>(),
    'Readings Loaded Success': props<{ page: LoadedReadingPage }>(),
    'Readings Loaded Failure': props<{ message: string }>(),
    'Reading Added Success': props<{ reading: GravityReading }>(),
    'Reading Added Failure': props<{ message: string; fields: Record<string, string> | null }>(),
    'Reading Edited Success': props<{ reading: GravityReading }>(),
    'Reading Edited Failure': props<{ message: string }>(),
    'Reading Deleted Success': props<{ readingId: number }>(),
    'Reading Deleted Failure': props<{ message: string }>(),
    'Import Progressed': props<{ percent: number }>(),
    'Import Finished': props<{ result: ReadingImportResult }>(),
    'Import Failed': props<{ message: string }>(),
    'Correction Factor Set Success': props<{ batch: Batch }>(),
    'Correction Factor Set Failure': props<{ message: string }>(),
    'Push Tokens Loaded Success': props<{ tokens: PushTokenSummary[] }>(),
    'Push Tokens Loaded Failure': props<{ message: string }>(),
    'Push Token Created Success': props<{ token: IssuedPushToken }>(),
    'Push Token Created Failure': props<{ message: string }>(),
    'Push Token Revoked Success': props<{ tokenId: number }>(),
    'Push Token Revoked Failure': props<{ message: string }>(),
  },
});
