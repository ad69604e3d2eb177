import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { firstValueFrom, of, throwError } from 'rxjs';
import { GravityReading } from '@shared/readings';
import { ReadingsClient } from '../readings-client';
import { GravityLogPageActions } from './gravity-log-page.actions';
import { ReadingsApiActions } from './readings-api.actions';
import { deleteReading, editReading } from './readings.effects';

describe('readings effects', () => {
  it('editReading sends only the corrected fields and hands back the stored reading', async () => {
    const stored = { id: 7, sampleTemperatureC: 24 } as GravityReading;
    const client = { edit: jest.fn(() => of(stored)) } as unknown as ReadingsClient;
    const action = await firstValueFrom(editReading(new Actions(of(GravityLogPageActions.readingEditSubmitted({ readingId: 7, changes: { sampleTemperatureC: 24 } }))), client));
    expect(client.edit).toHaveBeenCalledWith(7, { sampleTemperatureC: 24 });
    expect(action).toEqual(ReadingsApiActions.readingEditedSuccess({ reading: stored }));
  });

  it('editReading reports a refusal in the server\'s words', async () => {
    const error = new HttpErrorResponse({ status: 403, error: { error: { code: 'forbidden', message: "Only the batch's brewer, a brewer or an admin may change this batch." } } });
    const client = { edit: jest.fn(() => throwError(() => error)) } as unknown as ReadingsClient;
    const action = await firstValueFrom(editReading(new Actions(of(GravityLogPageActions.readingEditSubmitted({ readingId: 7, changes: { note: 'x' } }))), client));
    expect(action).toEqual(ReadingsApiActions.readingEditedFailure({ message: "Only the batch's brewer, a brewer or an admin may change this batch." }));
  });

  it('deleteReading deletes the confirmed reading', async () => {
    const client = { remove: jest.fn(() => of(undefined)) } as unknown as ReadingsClient;
    const action = await firstValueFrom(deleteReading(new Actions(of(GravityLogPageActions.readingDeleteConfirmed({ readingId: 7 }))), client));
    expect(client.remove).toHaveBeenCalledWith(7);
    expect(action).toEqual(ReadingsApiActions.readingDeletedSuccess({ readingId: 7 }));
  });
});
