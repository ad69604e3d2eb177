import { formatDuesAmount } from '@shared/dues';
import { MailContent } from '../mail-message';
import { renderMail } from './mail-layout';

/** The figures of one payment as a receipt shows them. */
export interface PaymentFacts {
  memberName: string;
  planName: string;
  amountCents: number;
  currency: string;
  periodStart: string;
  periodEnd: string;
  method: 'card' | 'cash';
  reference: string;
}

const factsOf = (p: PaymentFacts): [string, string][] => [
  ['Plan', p.planName],
  ['Amount', formatDuesAmount(p.amountCents, p.currency)],
  ['Covers', `${p.periodStart} to ${p.periodEnd}`],
  ['Paid by', p.method === 'card' ? 'card' : 'cash, recorded by an officer'],
  ['Reference', p.reference],
];

/** Receipt of a payment made by the member or recorded by an officer. */
export function duesReceiptMail(p: PaymentFacts, duesUrl: string): MailContent {
  return renderMail({
    subject: `Receipt: co-op dues paid through ${p.periodEnd}`,
    greeting: `Hello ${p.memberName},`,
    paragraphs: ['Thank you: your dues payment has been received.'],
    facts: factsOf(p),
    action: { label: 'Your dues', url: duesUrl },
  });
}

/** Result of the automatic renewal on the saved card: paid, or refused with the bank's reason. */
export function renewalResultMail(input: { memberName: string; outcome: { paid: PaymentFacts } | { refusedBecause: string; planName: string; amountCents: number; currency: string } }, duesUrl: string): MailContent {
  if ('paid' in input.outcome) {
    return renderMail({
      subject: `Dues renewed through ${input.outcome.paid.periodEnd}`,
      greeting: `Hello ${input.memberName},`,
      paragraphs: ['Your dues were renewed with your saved card.'],
      facts: factsOf(input.outcome.paid),
      action: { label: 'Your dues', url: duesUrl },
    });
  }
  const o = input.outcome;
  return renderMail({
    subject: 'Your dues could not be renewed',
    greeting: `Hello ${input.memberName},`,
    paragraphs: [`We tried to renew your ${o.planName} dues (${formatDuesAmount(o.amountCents, o.currency)}) with your saved card, and the payment was refused: ${o.refusedBecause}`, 'Nothing was charged. Please pay on the Dues page with another card, or pay an officer in cash.'],
    action: { label: 'Pay your dues', url: duesUrl },
  });
}

/** Reminder that dues have lapsed and new bookings are paused. */
export function duesOverdueMail(input: { memberName: string; paidThrough: string | null }, duesUrl: string): MailContent {
  return renderMail({
    subject: 'Your co-op dues are overdue',
    greeting: `Hello ${input.memberName},`,
    paragraphs: [
      input.paidThrough ? `Your dues were paid through ${input.paidThrough}.` : 'We have no dues payment from you yet.',
      'Until they are paid, the kit room takes no new bookings from you; bookings you already have stay as they are.',
    ],
    action: { label: 'Pay your dues', url: duesUrl },
  });
}

/** Tells an officer that a member with bookings ahead has lapsed dues. */
export function lapsedWithBookingsMail(input: { officerName: string; memberName: string; memberEmail: string; paidThrough: string | null; upcomingBookings: number }, ledgerUrl: string): MailContent {
  return renderMail({
    subject: `Dues lapsed: ${input.memberName} has ${input.upcomingBookings} booking(s) ahead`,
    greeting: `Hello ${input.officerName},`,
    paragraphs: [
      `${input.memberName} (${input.memberEmail}) has dues ${input.paidThrough ? `paid only through ${input.paidThrough}` : 'never paid'}, and still holds ${input.upcomingBookings} booking(s) in the kit room.`,
      'Those bookings stay; new ones are refused until the dues are paid. You may want to speak with them.',
    ],
    action: { label: 'Open the dues ledger', url: ledgerUrl },
  });
}
