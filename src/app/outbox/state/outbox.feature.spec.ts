import { OutboxMessageSummary } from '@shared/mail';
import { OutboxApiActions } from './outbox-api.actions';
import { OutboxPageActions } from './outbox-page.actions';
import { initialOutboxState, outboxFeature } from './outbox.feature';

const { reducer } = outboxFeature;

const summary = (overrides: Partial<OutboxMessageSummary> = {}): OutboxMessageSummary => ({
  id: 4,
  kind: 'dues-receipt',
  recipient: 'priya@fernhollow.example',
  subject: 'Receipt',
  state: 'failed',
  attempts: 2,
  lastError: 'connect ECONNREFUSED',
  nextAttemptAt: '2026-12-02T10:00:00.000Z',
  sentAt: null,
  createdAt: '2026-12-02T09:58:00.000Z',
  ...overrides,
});

describe('outboxFeature reducer', () => {
  it('replaces a message put back in line by its new summary', () => {
    const state = reducer({ ...initialOutboxState, messages: [summary(), summary({ id: 5 })] }, OutboxApiActions.retrySuccess({ summary: summary({ state: 'queued' }) }));

    expect(state.messages.map((m) => [m.id, m.state])).toEqual([[4, 'queued'], [5, 'failed']]);
  });

  it('forgets the opened message when it is closed', () => {
    const opened = { ...summary(), text: 't', html: '<p>h</p>' };

    const state = reducer({ ...initialOutboxState, opened }, OutboxPageActions.messageClosed());

    expect(state.opened).toBeNull();
  });
});
