import { createActionGroup, emptyProps, props } from '@ngrx/store';

export const OutboxPageActions = createActionGroup({
  source: 'Outbox Page',
  events: {
    Opened: emptyProps(),
    'Refresh Clicked': emptyProps(),
    'Message Opened': props<{ id: number }>(),
    'Message Closed': emptyProps(),
    'Retry Clicked': props<{ id: number }>(),
  },
});
