import { Knex } from 'knex';
import { DuesCurrency, DuesPayment, DuesPlan } from '@shared/dues';
import { DuesMembershipRow, DuesPaymentRow, DuesPlanRow } from '../db';

/** An ISO date from a DATE column (read back as midnight UTC). */
export const isoDate = (value: Date | null): string | null => (value ? value.toISOString().slice(0, 10) : null);

export const toPlan = (row: DuesPlanRow): DuesPlan => ({
  id: row.id,
  name: row.name,
  amountCents: row.amount_cents,
  currency: row.currency as DuesCurrency,
  period: row.period,
  active: Boolean(row.active),
});

type PaymentWithName = DuesPaymentRow & { member_name: string };

const toPayment = (row: PaymentWithName): DuesPayment => ({
  id: row.id,
  userId: row.user_id,
  memberName: row.member_name,
  planName: row.plan_name,
  amountCents: row.amount_cents,
  currency: row.currency as DuesCurrency,
  method: row.method,
  kind: row.kind,
  status: row.status,
  periodStart: isoDate(row.period_start)!,
  periodEnd: isoDate(row.period_end)!,
  paidAt: row.created_at.toISOString(),
  refundedAt: row.refunded_at ? row.refunded_at.toISOString() : null,
});

const paymentsWithNames = (db: Knex) =>
  db('dues_payments').join('users', 'users.id', 'dues_payments.user_id').select<PaymentWithName[]>('dues_payments.*', 'users.name as member_name');

/** Data access for dues plans, memberships and payments. */
export const duesRepository = {
  listPlans: async (db: Knex): Promise<DuesPlan[]> => (await db('dues_plans').orderBy(['amount_cents', 'name'])).map(toPlan),

  findPlan: async (db: Knex, id: number): Promise<DuesPlan | null> => {
    const row = await db('dues_plans').where({ id }).first();
    return row ? toPlan(row) : null;
  },

  async insertPlan(db: Knex, plan: Omit<DuesPlan, 'id' | 'active'>, actorId: number): Promise<number> {
    const [id] = await db('dues_plans').insert({ name: plan.name, amount_cents: plan.amountCents, currency: plan.currency, period: plan.period, created_by_user_id: actorId });
    return id;
  },

  planNameTaken: async (db: Knex, name: string): Promise<boolean> => Boolean(await db('dues_plans').where({ name }).first('id')),

  setPlanActive: (db: Knex, id: number, active: boolean) => db('dues_plans').where({ id }).update({ active, updated_at: new Date() }),

  findMembership: async (db: Knex, userId: number): Promise<DuesMembershipRow | null> => (await db('dues_memberships').where({ user_id: userId }).first()) ?? null,

  /** The member's row, locked for the rest of the transaction (made first when missing). */
  async lockMembership(trx: Knex.Transaction, userId: number): Promise<DuesMembershipRow> {
    await trx('dues_memberships').insert({ user_id: userId }).onConflict('user_id').ignore();
    return (await trx('dues_memberships').where({ user_id: userId }).forUpdate().first())!;
  },

  updateMembership: (db: Knex, userId: number, change: Omit<Partial<DuesMembershipRow>, 'paid_through'> & { paid_through?: string | null }) =>
    db('dues_memberships').where({ user_id: userId }).update({ ...change, updated_at: new Date() }),

  findPaymentByKey: async (db: Knex, key: string): Promise<DuesPaymentRow | null> => (await db('dues_payments').where({ idempotency_key: key }).first()) ?? null,

  async insertPayment(db: Knex, row: Parameters<typeof insertPaymentRow>[1]): Promise<number> {
    return insertPaymentRow(db, row);
  },

  findPayment: async (db: Knex, id: number): Promise<DuesPaymentRow | null> => (await db('dues_payments').where({ id }).first()) ?? null,

  lockPayment: async (trx: Knex.Transaction, id: number): Promise<DuesPaymentRow | null> => (await trx('dues_payments').where({ id }).forUpdate().first()) ?? null,

  markRefunded: (db: Knex, id: number, refundId: string | null, actorId: number, now: Date) =>
    db('dues_payments').where({ id }).update({ status: 'refunded', stripe_refund_id: refundId, refunded_at: now, refunded_by_user_id: actorId }),

  async paymentById(db: Knex, id: number): Promise<DuesPayment> {
    return toPayment((await paymentsWithNames(db).where('dues_payments.id', id).first())!);
  },

  paymentsOf: async (db: Knex, userId: number): Promise<DuesPayment[]> =>
    (await paymentsWithNames(db).where('dues_payments.user_id', userId).orderBy('dues_payments.id', 'desc').limit(100)).map(toPayment),

  recentPayments: async (db: Knex, limit: number): Promise<DuesPayment[]> => (await paymentsWithNames(db).orderBy('dues_payments.id', 'desc').limit(limit)).map(toPayment),

  /** Every active person with their membership (if any), for the ledger and the reminders. */
  membersWithDues: (db: Knex) =>
    db('users')
      .leftJoin('dues_memberships', 'dues_memberships.user_id', 'users.id')
      .leftJoin('dues_plans', 'dues_plans.id', 'dues_memberships.plan_id')
      .where('users.active', true)
      .orderBy('users.name')
      .select<{ user_id: number; name: string; email: string; plan_name: string | null; paid_through: Date | null; renew_by_card: number | null }[]>(
        'users.id as user_id',
        'users.name',
        'users.email',
        'dues_plans.name as plan_name',
        'dues_memberships.paid_through',
        'dues_memberships.renew_by_card',
      ),

  /** Memberships whose saved card should be charged: renewal on, a plan, and covered no later than `lastDay`. */
  renewalsDue: (db: Knex, lastDay: string) =>
    db('dues_memberships')
      .where({ renew_by_card: true })
      .whereNotNull('stripe_customer_id')
      .whereNotNull('plan_id')
      .where('paid_through', '<=', lastDay)
      .select('user_id'),
};

function insertPaymentRow(
  db: Knex,
  row: Omit<DuesPaymentRow, 'id' | 'created_at' | 'status' | 'stripe_refund_id' | 'refunded_at' | 'refunded_by_user_id' | 'period_start' | 'period_end' | 'previous_paid_through'> & {
    period_start: string;
    period_end: string;
    previous_paid_through: string | null;
  },
): Promise<number> {
  return db('dues_payments').insert(row).then(([id]) => id);
}
