import { DuesLedger, formatDuesAmount } from '@shared/dues';
import { csvOfCells } from '../http/csv-cells';

const HEADER = ['Paid at', 'Member', 'E-mail', 'Plan', 'Amount', 'Currency', 'Method', 'Kind', 'Status', 'Period start', 'Period end', 'Refunded at', 'Member paid through', 'Member standing'];

/** The ledger as CSV: one line per payment, with the member's standing today. */
export function ledgerCsv(ledger: DuesLedger): string {
  const members = new Map(ledger.members.map((m) => [m.userId, m]));
  const rows = ledger.payments.map((p) => {
    const member = members.get(p.userId);
    return [
      p.paidAt,
      p.memberName,
      member?.email ?? '',
      p.planName,
      formatDuesAmount(p.amountCents, p.currency).split(' ')[0],
      p.currency,
      p.method,
      p.kind,
      p.status,
      p.periodStart,
      p.periodEnd,
      p.refundedAt ?? '',
      member?.paidThrough ?? '',
      member?.status ?? '',
    ];
  });
  return csvOfCells([HEADER, ...rows]);
}
