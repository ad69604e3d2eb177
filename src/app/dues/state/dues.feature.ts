import { createFeature, createReducer, on } from '@ngrx/store';
import { DuesLedger, DuesOverview } from '@shared/dues';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { FieldErrors } from '@app/ui/server-field-errors';
import { DuesApiActions } from './dues-api.actions';
import { DuesLedgerPageActions } from './dues-ledger-page.actions';
import { DuesPageActions } from './dues-page.actions';

export interface DuesState {
  overview: DuesOverview | null;
  loading: boolean;
  loadError: string | null;
  paying: boolean;
  /** The refusal of the last payment (a declined card), shown beside the form. */
  paymentError: string | null;
  /** Goes up by one per successful payment, so the form makes a fresh idempotency key. */
  paymentsMade: number;
  ledger: DuesLedger | null;
  ledgerLoading: boolean;
  ledgerError: string | null;
  ledgerSaving: boolean;
  ledgerFieldErrors: FieldErrors | null;
  /** Goes up by one per saved ledger change, so the admin forms clear themselves. */
  ledgerChanges: number;
}

export const initialDuesState: DuesState = {
  overview: null,
  loading: false,
  loadError: null,
  paying: false,
  paymentError: null,
  paymentsMade: 0,
  ledger: null,
  ledgerLoading: false,
  ledgerError: null,
  ledgerSaving: false,
  ledgerFieldErrors: null,
  ledgerChanges: 0,
};

export const duesFeature = createFeature({
  name: 'dues',
  reducer: createReducer(
    initialDuesState,
    on(DuesPageActions.opened, (state): DuesState => ({ ...state, loading: true, loadError: null })),
    on(DuesApiActions.overviewLoadedSuccess, DuesApiActions.renewalStoppedSuccess, (state, { overview }): DuesState => ({ ...state, overview, loading: false })),
    on(DuesApiActions.overviewLoadedFailure, (state, { message }): DuesState => ({ ...state, loading: false, loadError: message })),
    on(DuesPageActions.paymentSubmitted, (state): DuesState => ({ ...state, paying: true, paymentError: null })),
    on(DuesApiActions.paymentMadeSuccess, (state, { overview }): DuesState => ({ ...state, overview, paying: false, paymentsMade: state.paymentsMade + 1 })),
    on(DuesApiActions.paymentMadeFailure, (state, { message }): DuesState => ({ ...state, paying: false, paymentError: message })),
    on(DuesLedgerPageActions.opened, (state): DuesState => ({ ...state, ledgerLoading: true, ledgerError: null })),
    on(DuesApiActions.ledgerLoadedSuccess, (state, { ledger }): DuesState => ({ ...state, ledger, ledgerLoading: false })),
    on(DuesApiActions.ledgerLoadedFailure, (state, { message }): DuesState => ({ ...state, ledgerLoading: false, ledgerError: message })),
    on(
      DuesLedgerPageActions.planSubmitted,
      DuesLedgerPageActions.planActiveChanged,
      DuesLedgerPageActions.cashPaymentSubmitted,
      DuesLedgerPageActions.refundConfirmed,
      (state): DuesState => ({ ...state, ledgerSaving: true, ledgerFieldErrors: null }),
    ),
    on(DuesApiActions.ledgerChangedSuccess, (state, { ledger }): DuesState => ({ ...state, ledger, ledgerSaving: false, ledgerChanges: state.ledgerChanges + 1 })),
    on(DuesApiActions.ledgerChangedFailure, (state, { fields }): DuesState => ({ ...state, ledgerSaving: false, ledgerFieldErrors: fields })),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (): DuesState => initialDuesState),
  ),
});
