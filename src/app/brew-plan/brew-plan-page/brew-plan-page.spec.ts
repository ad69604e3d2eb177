import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideCoopDateAdapter } from '@app/ui/coop-date-formats';
import { provideRouter } from '@angular/router';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { BrewPlanTimeline, SlotProposals } from '@shared/brew-plan';
import { initialAuthState } from '@app/auth/state/auth.feature';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { BrewPlanPageActions } from '../state/brew-plan-page.actions';
import { BrewPlanState, initialBrewPlanState } from '../state/brew-plan.feature';
import { BrewPlanPage } from './brew-plan-page';

const timeline: BrewPlanTimeline = {
  from: '2027-01-04', to: '2027-02-28', timeZone: 'Europe/Berlin', room: { inUse: 0.25, maintenance: 0 },
  lanes: [
    {
      kitItemId: 1, code: 'F1', name: 'Conical 1', capacityLitres: 30, inService: true, turnaroundHours: 24, utilisation: { inUse: 0.5, maintenance: 0 },
      entries: [{
        kind: 'batch', label: 'Hedge pale', start: '2027-01-04T07:00:00.000Z', end: '2027-01-26T17:00:00.000Z', heldUntil: '2027-01-27T17:00:00.000Z',
        bookingId: 3, batchId: 9, batchStatus: 'planned', phases: [{ phase: 'brew', start: '2027-01-04T07:00:00.000Z', end: '2027-01-04T23:00:00.000Z' }],
        forecastFinish: null, freesEarlyByDays: null,
      }],
    },
    { kitItemId: 2, code: 'F5', name: 'Big one', capacityLitres: 60, inService: true, turnaroundHours: 24, utilisation: { inUse: 0, maintenance: 0 }, entries: [] },
  ],
};

describe('BrewPlanPage', () => {
  let fixture: ComponentFixture<BrewPlanPage>;
  let store: MockStore;

  async function render(roles: ('member' | 'brewer' | 'admin')[], brewPlan: Partial<BrewPlanState> = {}): Promise<HTMLElement> {
    TestBed.configureTestingModule({
      imports: [BrewPlanPage],
      providers: [
        provideRouter([]),
        provideCoopDateAdapter(),
        provideMockStore({
          initialState: {
            auth: { ...initialAuthState, sessionLoaded: true, coopTimeZone: 'Europe/Berlin', user: generateMockSessionUser(roles, { id: 7 }) },
            brewPlan: { ...initialBrewPlanState, from: '2027-01-04', timeline, ...brewPlan },
          },
        }),
      ],
    });
    store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
    fixture = TestBed.createComponent(BrewPlanPage);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  it('shows a member every fermenter with its batches and utilisation, read-only', async () => {
    const element = await render(['member']);

    expect(store.dispatch).toHaveBeenCalledWith(expect.objectContaining({ type: BrewPlanPageActions.opened.type, mayPlan: false }));
    const lanes = [...element.querySelectorAll('cw-fermenter-lane')];
    expect(lanes.map((l) => l.querySelector('h3')?.textContent?.trim())).toEqual(['F1 Conical 1', 'F5 Big one']);
    expect(lanes[0].textContent).toContain('Hedge pale');
    expect(lanes[0].textContent).toContain('In use 50 %');
    expect(lanes[1].textContent).toContain('Free for the whole period.');
    expect(element.querySelector('cw-plan-batch-form')).toBeNull();
    expect(element.querySelector('cw-move-batch-form')).toBeNull();
  });

  it('links admins, and only admins, to the production report', async () => {
    const reportLink = (element: HTMLElement) => [...element.querySelectorAll('a')].find((a) => a.textContent?.includes('Production report'));

    expect(reportLink(await render(['member', 'admin']))?.getAttribute('href')).toBe('/brew-plan/report');
    TestBed.resetTestingModule();
    expect(reportLink(await render(['member', 'brewer']))).toBeUndefined();
  });

  it('links everyone to the stock needs of the planned batches', async () => {
    const element = await render(['member']);

    expect([...element.querySelectorAll('a')].find((a) => a.textContent?.includes('Stock needs'))?.getAttribute('href')).toBe('/stock/to-buy');
  });

  it('lets a brewer accept a proposal, sending the schedule the planner used', async () => {
    const proposals: SlotProposals = {
      recipeName: 'Hedge pale', schedule: { fermentationDays: 10, conditioningDays: 4 }, basis: 'brewer', weekStart: '2027-01-11',
      proposals: [{ kitItemId: 2, kitItemCode: 'F5', kitItemName: 'Big one', capacityLitres: 60, brewDate: '2027-01-11', startLocal: '2027-01-11T08:00', endLocal: '2027-01-26T18:00', heldUntil: '2027-01-27T17:00:00.000Z', phases: [] }],
      leftOut: [],
    };
    const element = await render(['member', 'brewer'], { proposals });
    const page = fixture.componentInstance as unknown as { requestProposals(p: unknown): void };
    page.requestProposals({ name: 'Second pale', brewerId: null, request: { recipeId: 4, recipeVersion: 2, volumeLitres: 40, wantedWeek: '2027-01-11' } });

    const accept = [...element.querySelectorAll('button')].find((b) => b.textContent?.includes('Accept F5'))!;
    const proposal = element.querySelector('[aria-label="Proposed slots"]')!.textContent!;
    accept.click();

    // A batch is planned in whole days: its dates are shown as days, in one style.
    expect(accept.textContent!.trim()).toBe('Accept F5 from 11 Jan 2027');
    expect(proposal).toContain('Brew 11 Jan 2027 · packaged by 26 Jan 2027');
    expect(proposal).toContain('Cleaning until 27 Jan 2027');
    expect(proposal).not.toMatch(/\d\d:\d\d/);

    expect(store.dispatch).toHaveBeenCalledWith(BrewPlanPageActions.slotAccepted({
      request: { name: 'Second pale', recipeId: 4, recipeVersion: 2, volumeLitres: 40, kitItemId: 2, brewDate: '2027-01-11', fermentationDays: 10, conditioningDays: 4 },
    }));
    expect(element.querySelector('cw-move-batch-form')).not.toBeNull();
  });

  it('lets an admin, and only an admin, choose whose batch it is from the active brewers, and sends that brewer with the accepted slot', async () => {
    const brewers = [{ id: 21, name: 'Tova Brewer' }];
    const proposals: SlotProposals = {
      recipeName: 'Hedge pale', schedule: { fermentationDays: 10, conditioningDays: 4 }, basis: 'brewer', weekStart: '2027-01-11',
      proposals: [{ kitItemId: 2, kitItemCode: 'F5', kitItemName: 'Big one', capacityLitres: 60, brewDate: '2027-01-11', startLocal: '2027-01-11T08:00', endLocal: '2027-01-26T18:00', heldUntil: '2027-01-27T17:00:00.000Z', phases: [] }],
      leftOut: [],
    };
    const brewerField = (element: HTMLElement) => [...element.querySelectorAll('cw-plan-batch-form mat-label')].find((l) => l.textContent?.trim() === 'Brewer');
    expect(brewerField(await render(['member', 'brewer'], { brewers }))).toBeUndefined();
    TestBed.resetTestingModule();
    const element = await render(['member', 'admin'], { brewers, proposals });
    expect(brewerField(element)).toBeDefined();
    expect(store.dispatch).toHaveBeenCalledWith(expect.objectContaining({ type: BrewPlanPageActions.opened.type, mayChooseBrewer: true }));

    const page = fixture.componentInstance as unknown as { requestProposals(p: unknown): void };
    page.requestProposals({ name: 'For Tova', brewerId: 21, request: { recipeId: 4, recipeVersion: 2, volumeLitres: 40, wantedWeek: '2027-01-11' } });
    [...element.querySelectorAll('button')].find((b) => b.textContent?.includes('Accept F5'))!.click();

    expect(store.dispatch).toHaveBeenCalledWith(BrewPlanPageActions.slotAccepted({
      request: { name: 'For Tova', brewerId: 21, recipeId: 4, recipeVersion: 2, volumeLitres: 40, kitItemId: 2, brewDate: '2027-01-11', fermentationDays: 10, conditioningDays: 4 },
    }));
  });

  it('names each fermenter left out and why, and drops the proposals once the plan form is edited', async () => {
    const proposals: SlotProposals = {
      recipeName: 'Hedge pale', schedule: { fermentationDays: 14, conditioningDays: 7 }, basis: 'ale-yeast', weekStart: '2027-01-11', proposals: [],
      leftOut: [
        { kitItemId: 1, kitItemCode: 'F1', kitItemName: 'Conical 1', reason: { kind: 'held', batchId: 9, batchName: 'Hedge pale', until: null }, message: 'Held by batch "Hedge pale" until it is packaged.' },
        { kitItemId: 3, kitItemCode: 'F3', kitItemName: 'Small one', reason: { kind: 'too-small', capacityLitres: 15 }, message: 'Too small: holds 15 L, the batch is 20 L.' },
      ],
    };
    const element = await render(['member', 'brewer'], { proposals });

    const leftOut = [...element.querySelectorAll('[aria-label="Fermenters not proposed"] li')].map((li) => li.textContent?.trim());
    expect(leftOut).toEqual(['F1 · Conical 1: Held by batch "Hedge pale" until it is packaged.', 'F3 · Small one: Too small: holds 15 L, the batch is 20 L.']);

    const volume = element.querySelector<HTMLInputElement>('cw-plan-batch-form input[formControlName="volumeLitres"]')!;
    volume.value = '';
    volume.dispatchEvent(new Event('input'));

    expect(store.dispatch).toHaveBeenCalledWith(BrewPlanPageActions.planFormChanged());
  });
});
