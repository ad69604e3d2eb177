import { SlotProposals } from '@shared/brew-plan';
import { BrewPlanApiActions } from './brew-plan-api.actions';
import { BrewPlanPageActions } from './brew-plan-page.actions';
import { brewPlanFeature, initialBrewPlanState } from './brew-plan.feature';

const reduce = brewPlanFeature.reducer;
const proposals: SlotProposals = { recipeName: 'Pale', schedule: { fermentationDays: 14, conditioningDays: 7 }, basis: 'ale-yeast', weekStart: '2027-01-04', proposals: [], leftOut: [] };

describe('brewPlanFeature', () => {
  it('clears the proposals and counts the slot once one is accepted', () => {
    const asked = reduce(initialBrewPlanState, BrewPlanApiActions.proposalsLoadedSuccess({ proposals }));
    const accepting = reduce(asked, BrewPlanPageActions.slotAccepted({ request: { name: 'x', recipeId: 1, recipeVersion: 1, volumeLitres: 20, kitItemId: 2, brewDate: '2027-01-04', fermentationDays: 14, conditioningDays: 7 } }));

    const accepted = reduce(accepting, BrewPlanApiActions.slotAcceptedSuccess({ planned: { batchId: 1, bookingId: 2, kitItemId: 2, kitItemCode: 'F2', brewDate: '2027-01-04', startLocal: '2027-01-04T08:00', endLocal: '2027-01-26T18:00' } }));

    expect(accepting.accepting).toBe(true);
    expect(accepted).toMatchObject({ accepting: false, proposals: null, slotsAccepted: 1 });
  });

  it('keeps what a move collided with beside that batch', () => {
    const moving = reduce(initialBrewPlanState, BrewPlanPageActions.batchMoveSubmitted({ batchId: 5, request: { brewDate: '2027-02-01' } }));

    const refused = reduce(moving, BrewPlanApiActions.batchMovedFailure({ batchId: 5, message: 'F1 is blocked for maintenance (booking #8)' }));

    expect(moving.movingBatchId).toBe(5);
    expect(refused).toMatchObject({ movingBatchId: null, moveError: { batchId: 5, message: 'F1 is blocked for maintenance (booking #8)' } });
  });

  it('shows the accepting brewer the reason a taken slot was refused', () => {
    const refused = reduce({ ...initialBrewPlanState, accepting: true }, BrewPlanApiActions.slotAcceptedFailure({ message: 'F2 is booked by Jonah Weiss (booking #4)', fields: null }));

    expect(refused).toMatchObject({ accepting: false, planError: 'F2 is booked by Jonah Weiss (booking #4)' });
  });

  it('drops proposals and the plan error once the plan form changes, so none made for old values can be accepted', () => {
    const shown = { ...reduce(initialBrewPlanState, BrewPlanApiActions.proposalsLoadedSuccess({ proposals })), planError: 'F2 is booked' };

    const edited = reduce(shown, BrewPlanPageActions.planFormChanged());

    expect(shown.proposals).toBe(proposals);
    expect(edited).toMatchObject({ proposals: null, planError: null });
  });
});
