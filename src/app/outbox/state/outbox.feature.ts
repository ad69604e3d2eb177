import { createFeature, createReducer, on } from '@ngrx/store';
import { OutboxMessage, OutboxMessageSummary } from '@shared/mail';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { OutboxApiActions } from './outbox-api.actions';
import { OutboxPageActions } from './outbox-page.actions';

export interface OutboxState {
  messages: OutboxMessageSummary[];
  loading: boolean;
  loadError: string | null;
  /** The message opened to read as sent. */
  opened: OutboxMessage | null;
}

export const initialOutboxState: OutboxState = { messages: [], loading: false, loadError: null, opened: null };

export const outboxFeature = createFeature({
  name: 'outbox',
  reducer: createReducer(
    initialOutboxState,
    on(OutboxPageActions.opened, OutboxPageActions.refreshClicked, (state): OutboxState => ({ ...state, loading: true, loadError: null })),
    on(OutboxApiActions.messagesLoadedSuccess, (state, { messages }): OutboxState => ({ ...state, messages, loading: false })),
    on(OutboxApiActions.messagesLoadedFailure, (state, { message }): OutboxState => ({ ...state, loading: false, loadError: message })),
    on(OutboxApiActions.messageLoadedSuccess, (state, { message }): OutboxState => ({ ...state, opened: message })),
    on(OutboxPageActions.messageClosed, (state): OutboxState => ({ ...state, opened: null })),
    on(OutboxApiActions.retrySuccess, (state, { summary }): OutboxState => ({
      ...state,
      messages: state.messages.map((each) => (each.id === summary.id ? summary : each)),
    })),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (): OutboxState => initialOutboxState),
  ),
});
