import { generateMockOverview } from '@app/testing/dues-mock';
import { DuesApiActions } from './dues-api.actions';
import { DuesPageActions } from './dues-page.actions';
import { duesFeature, initialDuesState } from './dues.feature';

const { reducer } = duesFeature;

describe('duesFeature reducer', () => {
  it('marks a payment on its way and clears the last refusal', () => {
    const state = reducer({ ...initialDuesState, paymentError: 'declined' }, DuesPageActions.paymentSubmitted({ request: { planId: 1, cardToken: 'tok_visa', saveCardForRenewal: false, idempotencyKey: 'k'.repeat(32) } }));

    expect(state).toMatchObject({ paying: true, paymentError: null });
  });

  it('takes the new overview and counts the payment when it succeeded', () => {
    const overview = generateMockOverview({ membership: { planId: 1, planName: 'Standard', paidThrough: '2027-01-01', status: 'paid-up', renewByCard: false, savedCard: null } });

    const state = reducer({ ...initialDuesState, paying: true }, DuesApiActions.paymentMadeSuccess({ overview }));

    expect(state).toMatchObject({ paying: false, paymentsMade: 1, overview });
  });

  it('keeps the standing and shows the refusal when the card was declined', () => {
    const overview = generateMockOverview();

    const state = reducer({ ...initialDuesState, overview, paying: true }, DuesApiActions.paymentMadeFailure({ message: 'The card was declined.' }));

    expect(state).toMatchObject({ paying: false, paymentError: 'The card was declined.', overview, paymentsMade: 0 });
  });
});
