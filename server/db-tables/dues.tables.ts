import { Knex } from 'knex';
import { DateInput } from './column-types';

// Membership plans, who has paid through when, and each payment.

export interface DuesPlanRow {
  id: number;
  name: string;
  amount_cents: number;
  currency: string;
  period: 'month' | 'year';
  active: number | boolean;
  created_by_user_id: number | null;
  created_at: Date;
  updated_at: Date;
}

export interface DuesMembershipRow {
  user_id: number;
  plan_id: number | null;
  /** DATE: comes back as a Date at midnight UTC. */
  paid_through: Date | null;
  stripe_customer_id: string | null;
  saved_card: string | null;
  renew_by_card: number | boolean;
  updated_at: Date;
}

export interface DuesPaymentRow {
  id: number;
  user_id: number;
  plan_id: number | null;
  plan_name: string;
  amount_cents: number;
  currency: string;
  method: 'card' | 'cash';
  kind: 'payment' | 'renewal';
  status: 'succeeded' | 'refunded';
  idempotency_key: string;
  stripe_charge_id: string | null;
  stripe_refund_id: string | null;
  period_start: Date;
  period_end: Date;
  previous_paid_through: Date | null;
  note: string;
  recorded_by_user_id: number | null;
  refunded_at: Date | null;
  refunded_by_user_id: number | null;
  created_at: Date;
}

declare module 'knex/types/tables' {
  interface Tables {
    dues_plans: Knex.CompositeTableType<DuesPlanRow, Pick<DuesPlanRow, 'name' | 'amount_cents' | 'currency' | 'period'> & { created_by_user_id?: number | null }, Partial<DuesPlanRow>>;
    dues_memberships: Knex.CompositeTableType<DuesMembershipRow, Omit<Partial<DuesMembershipRow>, 'paid_through'> & { user_id: number; paid_through?: DateInput | null }, Omit<Partial<DuesMembershipRow>, 'paid_through'> & { paid_through?: DateInput | null }>;
    dues_payments: Knex.CompositeTableType<
      DuesPaymentRow,
      Omit<DuesPaymentRow, 'id' | 'created_at' | 'status' | 'stripe_refund_id' | 'refunded_at' | 'refunded_by_user_id' | 'period_start' | 'period_end' | 'previous_paid_through'> & { period_start: DateInput; period_end: DateInput; previous_paid_through: DateInput | null },
      Partial<Pick<DuesPaymentRow, 'status' | 'stripe_refund_id' | 'refunded_at' | 'refunded_by_user_id'>>
    >;
  }
}
