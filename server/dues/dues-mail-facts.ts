import { DuesPaymentRow } from '../db';
import { PaymentFacts } from '../mail/templates/dues-mails';
import { isoDate } from './dues.repository';

/** The receipt figures of a stored payment. */
export function paymentFacts(row: Pick<DuesPaymentRow, 'id' | 'plan_name' | 'amount_cents' | 'currency' | 'period_start' | 'period_end' | 'method'>, memberName: string, periodStart?: string, periodEnd?: string): PaymentFacts {
  return {
    memberName,
    planName: row.plan_name,
    amountCents: row.amount_cents,
    currency: row.currency,
    periodStart: periodStart ?? isoDate(row.period_start)!,
    periodEnd: periodEnd ?? isoDate(row.period_end)!,
    method: row.method,
    reference: `DUES-${String(row.id).padStart(6, '0')}`,
  };
}
