import { Knex } from 'knex';
import { duesStatus, nextDuesPeriod } from '@shared/dues';
import { recordAudit } from '../audit/audit-log.repository';
import { outboxRepository } from '../mail/outbox.repository';
import { duesOverdueMail, lapsedWithBookingsMail, renewalResultMail } from '../mail/templates/dues-mails';
import { usersRepository } from '../users/users.repository';
import { coopToday } from './dues-clock';
import { DuesDeps } from './dues-payments.service';
import { settlePayment } from './dues-settlement';
import { duesRepository, isoDate } from './dues.repository';
import { CardDeclined } from './stripe-gateway';

/** Counts a member's bookings that have not started yet (given by the kit room; none without it). */
export type UpcomingBookingsCounter = (db: Knex, userId: number, now: Date) => Promise<number>;

/** The scheduled side of dues: renewals on saved cards, and reminders once dues lapse. */
export function createDuesRenewalsService(deps: DuesDeps & { upcomingBookings?: UpcomingBookingsCounter }) {
  const { db, gateway } = deps;
  const now = deps.now ?? (() => new Date());
  const duesUrl = `${deps.publicUrl}/dues`;

  async function renewOne(userId: number, today: string): Promise<'renewed' | 'refused' | 'skipped'> {
    const membership = await duesRepository.findMembership(db, userId);
    const plan = membership?.plan_id ? await duesRepository.findPlan(db, membership.plan_id) : null;
    if (!membership?.stripe_customer_id || !plan) return 'skipped';
    const period = nextDuesPeriod(isoDate(membership.paid_through), today, plan.period);
    // One key per member and period: a second run (or a second server) charges the same charge once.
    const key = `renewal:${userId}:${period.start}`;
    if (await duesRepository.findPaymentByKey(db, key)) return 'skipped';
    try {
      const chargeId = await gateway.charge({ customerId: membership.stripe_customer_id, memberId: userId, amountCents: plan.amountCents, currency: plan.currency, description: `Co-op dues renewal: ${plan.name}`, idempotencyKey: key });
      await settlePayment(db, { userId, plan, method: 'card', kind: 'renewal', idempotencyKey: key, chargeId, recordedBy: null }, today, duesUrl);
      return 'renewed';
    } catch (error) {
      if (!(error instanceof CardDeclined)) throw error;
      const member = (await usersRepository.findById(db, userId))!;
      await db.transaction(async (trx) => {
        await duesRepository.updateMembership(trx, userId, { renew_by_card: false });
        const content = renewalResultMail({ memberName: member.name, outcome: { refusedBecause: error.reason, planName: plan.name, amountCents: plan.amountCents, currency: plan.currency } }, duesUrl);
        await outboxRepository.enqueue(trx, { kind: 'dues-renewal', to: member.email, dedupeKey: `renewal-refused:${key}`, ...content });
        await recordAudit(trx, { actorUserId: null, action: 'dues-renewal-declined', subjectType: 'user', subjectId: userId, detail: { reason: error.reason } });
      });
      return 'refused';
    }
  }

  return {
    /** Charges saved cards whose period ends today or has ended; returns what happened per member. */
    async runRenewals(): Promise<Record<'renewed' | 'refused' | 'skipped', number>> {
      const today = coopToday(now(), deps.coopTimeZone);
      const counts = { renewed: 0, refused: 0, skipped: 0 };
      for (const { user_id } of await duesRepository.renewalsDue(db, today)) counts[await renewOne(user_id, today)]++;
      return counts;
    },

    /** Mails each member whose dues lapsed once per lapse; officers hear of lapsed members who still hold bookings. */
    async sendOverdueReminders(): Promise<number> {
      const today = coopToday(now(), deps.coopTimeZone);
      const members = await duesRepository.membersWithDues(db);
      const officers = (await usersRepository.list(db)).filter((u) => u.active && u.roles.includes('admin'));
      let reminded = 0;
      for (const m of members) {
        // Only people who have paid before: a co-op that has not started taking dues is not spammed.
        if (!m.paid_through || duesStatus(isoDate(m.paid_through), today) !== 'overdue') continue;
        const paidThrough = isoDate(m.paid_through);
        const lapse = `${m.user_id}:${paidThrough}`;
        await outboxRepository.enqueue(db, { kind: 'dues-overdue', to: m.email, dedupeKey: `dues-overdue:${lapse}`, ...duesOverdueMail({ memberName: m.name, paidThrough }, duesUrl) });
        reminded++;
        const upcoming = deps.upcomingBookings ? await deps.upcomingBookings(db, m.user_id, now()) : 0;
        for (const officer of upcoming > 0 ? officers : []) {
          const content = lapsedWithBookingsMail({ officerName: officer.name, memberName: m.name, memberEmail: m.email, paidThrough, upcomingBookings: upcoming }, `${deps.publicUrl}/dues/ledger`);
          await outboxRepository.enqueue(db, { kind: 'dues-lapsed-bookings', to: officer.email, dedupeKey: `dues-lapsed-bookings:${lapse}:${officer.id}`, ...content });
        }
      }
      return reminded;
    },
  };
}

export type DuesRenewalsService = ReturnType<typeof createDuesRenewalsService>;
