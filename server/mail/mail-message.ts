import { MailKind } from '@shared/mail';

/** The words of one message: a subject, a plain-text part and an HTML part. */
export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

/** A message to put in the outbox. A `dedupeKey` makes a second enqueue of the same notice a no-op. */
export interface OutgoingMail extends MailContent {
  kind: MailKind;
  to: string;
  dedupeKey?: string;
}
