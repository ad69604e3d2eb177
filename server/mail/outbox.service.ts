import { Knex } from 'knex';
import { OutboxMessage, OutboxMessageSummary } from '@shared/mail';
import { OutboxMessageRow } from '../db';
import { AppError } from '../errors/app-error';
import { outboxRepository } from './outbox.repository';

const summary = (row: OutboxMessageRow): OutboxMessageSummary => ({
  id: row.id,
  kind: row.kind as OutboxMessageSummary['kind'],
  recipient: row.recipient,
  subject: row.subject,
  state: row.state,
  attempts: row.attempts,
  lastError: row.last_error,
  nextAttemptAt: row.state === 'queued' || row.state === 'failed' ? row.next_attempt_at.toISOString() : null,
  sentAt: row.sent_at ? row.sent_at.toISOString() : null,
  createdAt: row.created_at.toISOString(),
});

/** The outbox as admins see it. */
export function createOutboxService(db: Knex) {
  return {
    list: async (): Promise<OutboxMessageSummary[]> => (await outboxRepository.list(db, 300)).map(summary),

    async message(id: number): Promise<OutboxMessage> {
      const row = await outboxRepository.findById(db, id);
      if (!row) throw new AppError('message-not-found', 'No message has this id.', 404);
      return { ...summary(row), text: row.text_body, html: row.html_body };
    },

    /** Puts a failed or abandoned message back in line. */
    async retry(id: number): Promise<OutboxMessageSummary> {
      if (!(await outboxRepository.requeue(db, id, new Date()))) throw new AppError('not-retryable', 'Only a failed or abandoned message can be sent again.', 409);
      return summary((await outboxRepository.findById(db, id))!);
    },
  };
}

export type OutboxService = ReturnType<typeof createOutboxService>;
