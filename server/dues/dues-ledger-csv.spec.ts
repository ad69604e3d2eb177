import { ledgerCsv } from './dues-ledger-csv';

describe('ledger CSV', () => {
  it('ledgerCsv writes a header and one line per payment with amounts in the major unit', () => {
    const csv = ledgerCsv({
      plans: [],
      members: [{ userId: 1, name: 'Ada', email: 'ada@x.example', planName: 'Standard', paidThrough: '2027-01-01', status: 'paid-up', renewByCard: false }],
      payments: [
        { id: 9, userId: 1, memberName: 'Ada', planName: 'Standard', amountCents: 1200, currency: 'EUR', method: 'card', kind: 'payment', status: 'succeeded', periodStart: '2026-12-02', periodEnd: '2027-01-01', paidAt: '2026-12-02T10:00:00.000Z', refundedAt: null },
      ],
    });
    const [header, line] = csv.trim().split('\n');
    expect(header.startsWith('Paid at,Member,E-mail,Plan,Amount')).toBe(true);
    expect(line).toBe('2026-12-02T10:00:00.000Z,Ada,ada@x.example,Standard,12.00,EUR,card,payment,succeeded,2026-12-02,2027-01-01,,2027-01-01,paid-up');
  });
});
