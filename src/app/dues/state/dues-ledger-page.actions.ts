import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { CreateDuesPlanRequest, RecordCashPaymentRequest } from '@shared/dues';

export const DuesLedgerPageActions = createActionGroup({
  source: 'Dues Ledger Page',
  events: {
    Opened: emptyProps(),
    'Plan Submitted': props<{ request: CreateDuesPlanRequest }>(),
    'Plan Active Changed': props<{ planId: number; active: boolean }>(),
    'Cash Payment Submitted': props<{ request: RecordCashPaymentRequest }>(),
    'Refund Confirmed': props<{ paymentId: number }>(),
  },
});
