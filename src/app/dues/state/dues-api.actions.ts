import { createActionGroup, props } from '@ngrx/store';
import { DuesLedger, DuesOverview } from '@shared/dues';
import { FieldErrors } from '@app/ui/server-field-errors';

export const DuesApiActions = createActionGroup({
  source: 'Dues API',
  events: {
    'Overview Loaded Success': props<{ overview: DuesOverview }>(),
    'Overview Loaded Failure': props<{ message: string }>(),
    'Payment Made Success': props<{ overview: DuesOverview }>(),
    'Payment Made Failure': props<{ message: string }>(),
    'Renewal Stopped Success': props<{ overview: DuesOverview }>(),
    'Renewal Stopped Failure': props<{ message: string }>(),
    'Ledger Loaded Success': props<{ ledger: DuesLedger }>(),
    'Ledger Loaded Failure': props<{ message: string }>(),
    'Ledger Changed Success': props<{ ledger: DuesLedger; notice: string }>(),
    'Ledger Changed Failure': props<{ message: string; fields: FieldErrors | null }>(),
  },
});
