import { Knex } from 'knex';
import { PayDuesRequest, RecordCashPaymentRequest } from '@shared/dues';
import { recordAudit } from '../audit/audit-log.repository';
import { AppError } from '../errors/app-error';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { usersRepository } from '../users/users.repository';
import { coopToday } from './dues-clock';
import { settlePayment } from './dues-settlement';
import { duesRepository, isoDate } from './dues.repository';
import { CardDeclined, StripeGateway } from './stripe-gateway';

export interface DuesDeps {
  db: Knex;
  gateway: StripeGateway;
  coopTimeZone: string;
  publicUrl: string;
  now?: () => Date;
}

const declined = (reason: string) =>
  new AppError('card-declined', `The card was declined (${reason.replace(/\.$/, '')}). Nothing was charged and your dues are unchanged; try another card.`, 402);

async function activePlan(db: Knex, planId: number) {
  const plan = await duesRepository.findPlan(db, planId);
  if (!plan || !plan.active) throw new AppError('plan-not-found', 'This plan is not offered (any more).', 400, { planId: 'is not an offered plan' });
  return plan;
}

/** Paying dues: by card through the gateway, in cash recorded by an officer, and refunds. */
export function createDuesPaymentsService(deps: DuesDeps) {
  const { db, gateway } = deps;
  const now = deps.now ?? (() => new Date());
  const duesUrl = `${deps.publicUrl}/dues`;
  const today = () => coopToday(now(), deps.coopTimeZone);

  return {
    /**
     * Charges the card behind the token and moves the paid-through date. Nothing is written before the
     * charge succeeded; a retry with the same key returns the first payment and charges nothing new.
     */
    async payByCard(userId: number, request: PayDuesRequest): Promise<number> {
      const key = `pay:${userId}:${request.idempotencyKey}`;
      const done = await duesRepository.findPaymentByKey(db, key);
      if (done) return done.id;
      const plan = await activePlan(db, request.planId);
      const member = (await usersRepository.findById(db, userId))!;
      try {
        const card = await gateway.saveCard(request.cardToken, member.email, key);
        const chargeId = await gateway.charge({ customerId: card.customerId, memberId: userId, amountCents: plan.amountCents, currency: plan.currency, description: `Co-op dues: ${plan.name}`, idempotencyKey: key });
        return await settlePayment(
          db,
          { userId, plan, method: 'card', kind: 'payment', idempotencyKey: key, chargeId, recordedBy: null, savedCard: request.saveCardForRenewal ? card : null },
          today(),
          duesUrl,
        );
      } catch (error) {
        if (!(error instanceof CardDeclined)) throw error;
        await recordAudit(db, { actorUserId: userId, action: 'dues-card-declined', subjectType: 'user', subjectId: userId, detail: { plan: plan.name, reason: error.reason } });
        throw declined(error.reason);
      }
    },

    /** An officer notes dues handed over in cash. */
    async recordCash(actorId: number, request: RecordCashPaymentRequest): Promise<number> {
      const member = await usersRepository.findById(db, request.userId);
      if (!member?.active) throw new AppError('member-not-found', 'No active member has this id.', 400, { userId: 'is not an active member' });
      const plan = await activePlan(db, request.planId);
      const key = `cash:${actorId}:${request.idempotencyKey}`;
      return settlePayment(db, { userId: member.id, plan, method: 'cash', kind: 'payment', idempotencyKey: key, chargeId: null, note: request.note, recordedBy: actorId }, today(), duesUrl);
    },

    /** Refunds a payment in full (the card charge through the gateway first); the paid-through date steps back when this was the latest period. */
    async refund(actorId: number, paymentId: number): Promise<void> {
      const payment = await duesRepository.findPayment(db, paymentId);
      if (!payment) throw new AppError('payment-not-found', 'No payment has this id.', 404);
      if (payment.status === 'refunded') throw new AppError('already-refunded', 'This payment was refunded already.', 409);
      const refundId = payment.stripe_charge_id ? await gateway.refund(payment.stripe_charge_id, `refund:${payment.id}`) : null;
      await transactionWithRetry(db, async (trx) => {
          const membership = await duesRepository.lockMembership(trx, payment.user_id);
          const locked = await duesRepository.lockPayment(trx, paymentId);
          if (!locked || locked.status === 'refunded') return;
          await duesRepository.markRefunded(trx, paymentId, refundId, actorId, now());
          if (isoDate(membership.paid_through) === isoDate(locked.period_end)) {
            await duesRepository.updateMembership(trx, locked.user_id, { paid_through: isoDate(locked.previous_paid_through) });
          }
          await recordAudit(trx, { actorUserId: actorId, action: 'dues-refunded', subjectType: 'dues_payment', subjectId: paymentId, detail: { refundId, amountCents: locked.amount_cents, currency: locked.currency } });
        })
      ;
    },
  };
}

export type DuesPaymentsService = ReturnType<typeof createDuesPaymentsService>;
