import { Knex } from 'knex';
import { DuesPlan, nextDuesPeriod } from '@shared/dues';
import { recordAudit } from '../audit/audit-log.repository';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { OutgoingMail } from '../mail/mail-message';
import { outboxRepository } from '../mail/outbox.repository';
import { duesReceiptMail, renewalResultMail } from '../mail/templates/dues-mails';
import { usersRepository } from '../users/users.repository';
import { paymentFacts } from './dues-mail-facts';
import { duesRepository, isoDate } from './dues.repository';

/** A payment that has been taken (card charged or cash handed over) and must now be written down. */
export interface TakenPayment {
  userId: number;
  plan: DuesPlan;
  method: 'card' | 'cash';
  kind: 'payment' | 'renewal';
  idempotencyKey: string;
  chargeId: string | null;
  note?: string;
  recordedBy: number | null;
  savedCard?: { customerId: string; label: string } | null;
}

const isDuplicate = (error: unknown) => (error as { code?: string }).code === 'ER_DUP_ENTRY';

/**
 * Writes a taken payment in one transaction: the payment, the moved paid-through date, the saved
 * card, the receipt in the outbox and the audit entry. A second call with the same key writes nothing.
 * Returns the payment id.
 */
export async function settlePayment(db: Knex, taken: TakenPayment, today: string, duesUrl: string): Promise<number> {
  try {
    return await transactionWithRetry(db, async (trx) => {
      const membership = await duesRepository.lockMembership(trx, taken.userId);
      const existing = await duesRepository.findPaymentByKey(trx, taken.idempotencyKey);
      if (existing) return existing.id;
      const previous = isoDate(membership.paid_through);
      const period = nextDuesPeriod(previous, today, taken.plan.period);
      const row = {
        user_id: taken.userId,
        plan_id: taken.plan.id,
        plan_name: taken.plan.name,
        amount_cents: taken.plan.amountCents,
        currency: taken.plan.currency,
        method: taken.method,
        kind: taken.kind,
        idempotency_key: taken.idempotencyKey,
        stripe_charge_id: taken.chargeId,
        period_start: period.start,
        period_end: period.end,
        previous_paid_through: previous,
        note: taken.note ?? '',
        recorded_by_user_id: taken.recordedBy,
      };
      const id = await duesRepository.insertPayment(trx, row);
      await duesRepository.updateMembership(trx, taken.userId, {
        plan_id: taken.plan.id,
        paid_through: period.end,
        ...(taken.savedCard ? { stripe_customer_id: taken.savedCard.customerId, saved_card: taken.savedCard.label, renew_by_card: true } : {}),
      });
      const member = (await usersRepository.findById(trx, taken.userId))!;
      const facts = paymentFacts({ ...row, id, period_start: new Date(period.start), period_end: new Date(period.end) }, member.name, period.start, period.end);
      const content = taken.kind === 'renewal' ? renewalResultMail({ memberName: member.name, outcome: { paid: facts } }, duesUrl) : duesReceiptMail(facts, duesUrl);
      const mail: OutgoingMail = { kind: taken.kind === 'renewal' ? 'dues-renewal' : 'dues-receipt', to: member.email, dedupeKey: `receipt:${taken.idempotencyKey}`, ...content };
      await outboxRepository.enqueue(trx, mail);
      await recordAudit(trx, {
        actorUserId: taken.recordedBy ?? taken.userId,
        action: `dues-${taken.kind}-${taken.method}`,
        subjectType: 'dues_payment',
        subjectId: id,
        detail: { userId: taken.userId, plan: taken.plan.name, amountCents: taken.plan.amountCents, currency: taken.plan.currency, paidThrough: period.end },
      });
      return id;
    });
  } catch (error) {
    // A parallel retry with the same key got there first: that one payment stands.
    if (!isDuplicate(error)) throw error;
    return (await duesRepository.findPaymentByKey(db, taken.idempotencyKey))!.id;
  }
}
