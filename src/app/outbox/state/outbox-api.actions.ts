import { createActionGroup, props } from '@ngrx/store';
import { OutboxMessage, OutboxMessageSummary } from '@shared/mail';

export const OutboxApiActions = createActionGroup({
  source: 'Outbox API',
  events: {
    'Messages Loaded Success': props<{ messages: OutboxMessageSummary[] }>(),
    'Messages Loaded Failure': props<{ message: string }>(),
    'Message Loaded Success': props<{ message: OutboxMessage }>(),
    'Message Loaded Failure': props<{ message: string }>(),
    'Retry Success': props<{ summary: OutboxMessageSummary }>(),
    'Retry Failure': props<{ message: string }>(),
  },
});
