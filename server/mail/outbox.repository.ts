import { Knex } from 'knex';
import { OutboxMessageRow } from '../db';
import { OutgoingMail } from './mail-message';

const DUE_STATES = ['queued', 'failed'] as const;

/** Data access for the outbox. Messages are claimed under SKIP LOCKED so two processes never take one row. */
export const outboxRepository = {
  /** Adds a message; pass the transaction of the change it reports. A known dedupe key adds nothing. */
  async enqueue(db: Knex, mail: OutgoingMail): Promise<void> {
    await db('outbox_messages')
      .insert({ kind: mail.kind, recipient: mail.to, subject: mail.subject, text_body: mail.text, html_body: mail.html, dedupe_key: mail.dedupeKey ?? null })
      .onConflict('dedupe_key')
      .ignore();
  },

  /** Claims up to `limit` messages that are due (or whose earlier claim ran out) for `holder` until `claimUntil`. */
  async claimDue(db: Knex, holder: string, now: Date, claimUntil: Date, limit: number, onlyIds?: number[]): Promise<OutboxMessageRow[]> {
    return db.transaction(async (trx) => {
      const rows: OutboxMessageRow[] = await trx('outbox_messages')
        .where((ready) =>
          ready
            .where((due) => due.whereIn('state', DUE_STATES).where('next_attempt_at', '<=', now))
            .orWhere((stale) => stale.where('state', 'sending').where('claim_expires_at', '<', now)),
        )
        .modify((query) => {
          if (onlyIds) query.whereIn('id', onlyIds);
        })
        .orderBy('id')
        .limit(limit)
        .forUpdate()
        .skipLocked();
      if (rows.length === 0) return [];
      await trx('outbox_messages')
        .whereIn('id', rows.map((row: OutboxMessageRow) => row.id))
        .update({ state: 'sending', claimed_by: holder, claim_expires_at: claimUntil });
      return rows;
    });
  },

  /** Marks a claimed message sent; false when the claim was lost meanwhile. */
  async markSent(db: Knex, id: number, holder: string, now: Date): Promise<boolean> {
    const changed = await db('outbox_messages')
      .where({ id, claimed_by: holder, state: 'sending' })
      .update({ attempts: db.raw('attempts + 1') as unknown as number, state: 'sent', sent_at: now, claimed_by: null, claim_expires_at: null, last_error: null });
    return changed === 1;
  },

  async markFailed(db: Knex, id: number, holder: string, error: string, retryAt: Date | null): Promise<void> {
    await db('outbox_messages')
      .where({ id, claimed_by: holder, state: 'sending' })
      .update({
        attempts: db.raw('attempts + 1') as unknown as number,
        state: retryAt ? 'failed' : 'abandoned',
        next_attempt_at: retryAt ?? undefined,
        last_error: error.slice(0, 500),
        claimed_by: null,
        claim_expires_at: null,
      });
  },

  /** Puts an abandoned or failed message back in line at once (an admin's retry). */
  async requeue(db: Knex, id: number, now: Date): Promise<boolean> {
    const changed = await db('outbox_messages').where({ id }).whereIn('state', ['failed', 'abandoned']).update({ state: 'queued', next_attempt_at: now });
    return changed === 1;
  },

  list: (db: Knex, limit: number): Promise<OutboxMessageRow[]> => db('outbox_messages').orderBy('id', 'desc').limit(limit),

  findById: async (db: Knex, id: number): Promise<OutboxMessageRow | null> => (await db('outbox_messages').where({ id }).first()) ?? null,
};
