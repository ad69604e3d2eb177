import { Knex } from 'knex';
import { MailSender } from './mail-transport';
import { outboxRepository } from './outbox.repository';

/** Attempts before a message is given up (it stays in the outbox, marked abandoned, for an admin to retry). */
export const MAX_SEND_ATTEMPTS = 10;
const BATCH = 20;
const CLAIM_MS = 2 * 60 * 1000;

/** Wait before attempt n+1: 30 s doubling up to an hour. */
export function retryDelayMs(attemptsSoFar: number): number {
  return Math.min(30_000 * 2 ** Math.max(0, attemptsSoFar - 1), 3_600_000);
}

/** Sends what is due in the outbox; each message is claimed first, so another process never sends it too. */
export function createOutboxDispatcher(deps: { db: Knex; send: MailSender; holder: string; now?: () => Date }) {
  const now = deps.now ?? (() => new Date());
  return {
    /** One sweep (of everything due, or only of the given messages): returns how many were sent. */
    async dispatchDue(onlyIds?: number[]): Promise<number> {
      const start = now();
      const claimed = await outboxRepository.claimDue(deps.db, deps.holder, start, new Date(start.getTime() + CLAIM_MS), BATCH, onlyIds);
      let sent = 0;
      for (const row of claimed) {
        try {
          await deps.send({ to: row.recipient, subject: row.subject, text: row.text_body, html: row.html_body });
          if (await outboxRepository.markSent(deps.db, row.id, deps.holder, now())) sent++;
        } catch (error) {
          const attempts = row.attempts + 1;
          const retryAt = attempts >= MAX_SEND_ATTEMPTS ? null : new Date(now().getTime() + retryDelayMs(attempts));
          await outboxRepository.markFailed(deps.db, row.id, deps.holder, (error as Error).message || String(error), retryAt);
        }
      }
      return sent;
    },
  };
}

export type OutboxDispatcher = ReturnType<typeof createOutboxDispatcher>;
