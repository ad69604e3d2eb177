import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { Action, Store } from '@ngrx/store';
import { firstValueFrom, Observable, of, throwError } from 'rxjs';
import { AcceptSlotRequest, BrewPlanTimeline, PlannedBatch } from '@shared/brew-plan';
import { BrewPlanClient } from '../brew-plan-client';
import { TIMELINE_WEEKS } from '../timeline-weeks';
import { BrewPlanApiActions } from './brew-plan-api.actions';
import { BrewPlanPageActions } from './brew-plan-page.actions';
import { acceptSlot, loadTimeline, moveBatch } from './brew-plan.effects';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const fakeClient = (overrides: Partial<Record<keyof BrewPlanClient, (...args: never[]) => Observable<unknown>>>) => overrides as unknown as BrewPlanClient;
const storeWith = (value: unknown) => ({ select: () => of(value) }) as unknown as Store;
const planned: PlannedBatch = { batchId: 4, bookingId: 8, kitItemId: 2, kitItemCode: 'F2', brewDate: '2027-01-11', startLocal: '2027-01-11T08:00', endLocal: '2027-02-02T18:00' };
const request: AcceptSlotRequest = { name: 'Hedge pale', recipeId: 1, recipeVersion: 2, volumeLitres: 20, kitItemId: 2, brewDate: '2027-01-11', fermentationDays: 14, conditioningDays: 7 };

describe('brew plan effects', () => {
  it('loadTimeline reloads the weeks shown once a slot is accepted', async () => {
    const timeline = { from: '2027-01-04' } as BrewPlanTimeline;
    const load = jest.fn(() => of(timeline));

    const result = await firstValueFrom(loadTimeline(actionsOf(BrewPlanApiActions.slotAcceptedSuccess({ planned })), storeWith('2027-01-04'), fakeClient({ timeline: load })));

    expect(load).toHaveBeenCalledWith('2027-01-04', TIMELINE_WEEKS);
    expect(result).toEqual(BrewPlanApiActions.timelineLoadedSuccess({ timeline }));
  });

  it('acceptSlot passes on the server’s words when someone took the slot meanwhile (409)', async () => {
    const message = 'F2 is booked by Jonah Weiss (booking #40) from Mon 11 Jan 10:00 until Mon 11 Jan 12:00…';
    const refusal = new HttpErrorResponse({ status: 409, error: { error: { code: 'booking-conflict', message } } });

    const result = await firstValueFrom(acceptSlot(actionsOf(BrewPlanPageActions.slotAccepted({ request })), fakeClient({ accept: () => throwError(() => refusal) })));

    expect(result).toEqual(BrewPlanApiActions.slotAcceptedFailure({ message, fields: null }));
  });

  it('moveBatch sends the new brew date and maps the answer', async () => {
    const move = jest.fn(() => of(planned));

    const result = await firstValueFrom(moveBatch(actionsOf(BrewPlanPageActions.batchMoveSubmitted({ batchId: 4, request: { brewDate: '2027-01-11' } })), fakeClient({ move })));

    expect(move).toHaveBeenCalledWith(4, { brewDate: '2027-01-11' });
    expect(result).toEqual(BrewPlanApiActions.batchMovedSuccess({ planned }));
  });
});
