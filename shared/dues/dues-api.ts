import { DuesCurrency, DuesPeriod, DuesPlan } from './dues-plan';
import { DuesStatus } from './dues-standing';
import { TestCard } from './test-cards';

export const DUES_PATH = '/api/dues';

/** A member's dues as they stand. */
export interface DuesMembership {
  planId: number | null;
  planName: string | null;
  /** Last day covered (ISO date), null when never paid. */
  paidThrough: string | null;
  status: DuesStatus;
  renewByCard: boolean;
  /** e.g. "Visa ending 4242" when a card is saved for renewal. */
  savedCard: string | null;
}

/** One payment (or refunded payment) as the ledger and the member see it. */
export interface DuesPayment {
  id: number;
  userId: number;
  memberName: string;
  planName: string;
  amountCents: number;
  currency: DuesCurrency;
  method: 'card' | 'cash';
  kind: 'payment' | 'renewal';
  status: 'succeeded' | 'refunded';
  periodStart: string;
  periodEnd: string;
  paidAt: string;
  refundedAt: string | null;
}

/** GET /api/dues/me */
export interface DuesOverview {
  plans: DuesPlan[];
  membership: DuesMembership;
  payments: DuesPayment[];
  /** True against the test fake or a test key: the page says so and offers the test cards. */
  testMode: boolean;
  testCards: readonly TestCard[];
}

/** POST /api/dues/payments: pay one period by card. `idempotencyKey` is made once per attempt by the client. */
export interface PayDuesRequest {
  planId: number;
  cardToken: string;
  saveCardForRenewal: boolean;
  idempotencyKey: string;
}

/** POST /api/dues/plans (admin) */
export interface CreateDuesPlanRequest {
  name: string;
  amountCents: number;
  currency: DuesCurrency;
  period: DuesPeriod;
}

/** POST /api/dues/cash-payments (admin) */
export interface RecordCashPaymentRequest {
  userId: number;
  planId: number;
  idempotencyKey: string;
  note: string;
}

/** One member's line in the admin ledger. */
export interface DuesLedgerMember {
  userId: number;
  name: string;
  email: string;
  planName: string | null;
  paidThrough: string | null;
  status: DuesStatus;
  renewByCard: boolean;
}

/** GET /api/dues/ledger (admin) */
export interface DuesLedger {
  members: DuesLedgerMember[];
  payments: DuesPayment[];
  plans: DuesPlan[];
}

/** GET /api/dues/ledger.csv (admin) */
export const DUES_LEDGER_CSV_PATH = `${DUES_PATH}/ledger.csv`;
