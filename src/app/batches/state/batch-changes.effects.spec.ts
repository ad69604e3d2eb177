import { Actions } from '@ngrx/effects';
import { firstValueFrom, of } from 'rxjs';
import { Batch } from '@shared/batches';
import { BatchesClient } from '../batches-client';
import { BatchPageActions } from './batch-page.actions';
import { BatchesApiActions } from './batches-api.actions';
import { moveStatus, saveDetails } from './batch-changes.effects';

const batch = { id: 5, name: 'Test batch' } as Batch;

describe('batch change effects', () => {
  it('moveStatus sends a back-dated move with its time', async () => {
    const client = { move: jest.fn(() => of(batch)) } as unknown as BatchesClient;
    const chosen = BatchPageActions.statusMoveChosen({ batchId: 5, status: 'brewing', skipped: [], at: '2026-11-20T07:30:00.000Z' });
    const action = await firstValueFrom(moveStatus(new Actions(of(chosen)), client));
    expect(client.move).toHaveBeenCalledWith(5, { status: 'brewing', confirmSkip: false, at: '2026-11-20T07:30:00.000Z' });
    expect(action).toEqual(BatchesApiActions.batchChangedSuccess({ batch, message: 'Test batch is now brewing.' }));
  });

  it('moveStatus sends a move for now without a time, and a skipping move only once confirmed', async () => {
    const client = { move: jest.fn(() => of(batch)) } as unknown as BatchesClient;
    await firstValueFrom(moveStatus(new Actions(of(BatchPageActions.skipConfirmed({ batchId: 5, status: 'packaged', at: null }))), client));
    expect(client.move).toHaveBeenCalledWith(5, { status: 'packaged', confirmSkip: true });
  });

  it('saveDetails sends only the changes and reports the saved batch', async () => {
    const client = { update: jest.fn(() => of(batch)) } as unknown as BatchesClient;
    const action = await firstValueFrom(saveDetails(new Actions(of(BatchPageActions.detailsSubmitted({ batchId: 5, changes: { plannedVolumeLitres: 23 } }))), client));
    expect(client.update).toHaveBeenCalledWith(5, { plannedVolumeLitres: 23 });
    expect(action).toEqual(BatchesApiActions.batchChangedSuccess({ batch, message: 'Batch details saved.' }));
  });
});
