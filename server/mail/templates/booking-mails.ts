import { MailContent } from '../mail-message';
import { renderMail } from './mail-layout';

/** What a booking message says about the booking; times are the wall-clock times as booked. */
export interface BookingFacts {
  memberName: string;
  itemCode: string;
  itemName: string;
  startLocal: string;
  endLocal: string;
  timeZone: string;
  /** Hours the item stays held for cleaning after the end. */
  turnaroundHours: number;
}

const when = (local: string) => local.replace('T', ' ');

const factsOf = (b: BookingFacts): [string, string][] => [
  ['Kit', `${b.itemCode} · ${b.itemName}`],
  ['From', `${when(b.startLocal)} (${b.timeZone})`],
  ['Until', `${when(b.endLocal)} (${b.timeZone})`],
  ['Cleaning after', b.turnaroundHours ? `${b.turnaroundHours} h, the item stays held meanwhile` : 'none'],
];

/** Sent when a booking is made (by the member or an admin for them). */
export function bookingConfirmationMail(b: BookingFacts, bookingsUrl: string): MailContent {
  return renderMail({
    subject: `Booked: ${b.itemCode} from ${when(b.startLocal)}`,
    greeting: `Hello ${b.memberName},`,
    paragraphs: ['Your booking in the kit room is confirmed.'],
    facts: factsOf(b),
    action: { label: 'Your bookings', url: bookingsUrl },
    closing: 'Please leave the kit clean and follow the co-op’s rules for hot liquids, CO2 and cleaning chemicals.',
  });
}

/** Sent the day before a booking starts. */
export function bookingReminderMail(b: BookingFacts, bookingsUrl: string): MailContent {
  return renderMail({
    subject: `Tomorrow: ${b.itemCode} is booked for you from ${when(b.startLocal)}`,
    greeting: `Hello ${b.memberName},`,
    paragraphs: ['A reminder of your booking tomorrow. If you no longer need it, cancel it so others can use the kit.'],
    facts: factsOf(b),
    action: { label: 'Your bookings', url: bookingsUrl },
  });
}
