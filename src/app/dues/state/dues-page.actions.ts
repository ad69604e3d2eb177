import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { PayDuesRequest } from '@shared/dues';

export const DuesPageActions = createActionGroup({
  source: 'Dues Page',
  events: {
    Opened: emptyProps(),
    'Payment Submitted': props<{ request: PayDuesRequest }>(),
    'Renewal Stopped': emptyProps(),
  },
});
