import { Actions } from '@ngrx/effects';
import { Action } from '@ngrx/store';
import { firstValueFrom, of, throwError } from 'rxjs';
import { HttpErrorResponse } from '@angular/common/http';
import { LabClient } from '../lab-client';
import { LabApiActions } from './lab-api.actions';
import { StrengthCheckPageActions } from './strength-check-page.actions';
import { loadToleranceClasses, saveToleranceClass } from './tolerance-classes.effects';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const beer = { id: 3, name: 'Beer', tolerancePercentVolume: 0.5, note: '', retired: false };

describe('tolerance classes effects', () => {
  it('loadToleranceClasses loads retired classes too when the page opens', async () => {
    const client = { toleranceClasses: jest.fn(() => of([beer])) } as unknown as LabClient;
    const action = await firstValueFrom(loadToleranceClasses(actionsOf(StrengthCheckPageActions.opened()), client));
    expect(client.toleranceClasses).toHaveBeenCalledWith();
    expect(action).toEqual(LabApiActions.toleranceClassesLoadedSuccess({ toleranceClasses: [beer] }));
  });

  it('saveToleranceClass puts a change to its id', async () => {
    const client = { changeToleranceClass: jest.fn(() => of(beer)) } as unknown as LabClient;
    const input = { name: 'Beer', tolerancePercentVolume: 0.5, note: '' };
    const action = await firstValueFrom(saveToleranceClass(actionsOf(StrengthCheckPageActions.toleranceClassChanged({ id: 3, input })), client));
    expect(client.changeToleranceClass).toHaveBeenCalledWith(3, input);
    expect(action).toEqual(LabApiActions.toleranceClassSavedSuccess({ toleranceClass: beer }));
  });

  it('saveToleranceClass turns a refusal into a failure with the server reason', async () => {
    const error = new HttpErrorResponse({ status: 409, error: { error: { code: 'name-taken', message: 'A product class already has this name.' } } });
    const client = { addToleranceClass: jest.fn(() => throwError(() => error)) } as unknown as LabClient;
    const input = { name: 'Beer', tolerancePercentVolume: 0.5, note: '' };
    const action = await firstValueFrom(saveToleranceClass(actionsOf(StrengthCheckPageActions.toleranceClassAdded({ input })), client));
    expect(action).toEqual(LabApiActions.toleranceClassSavedFailure({ message: 'A product class already has this name.' }));
  });
});
