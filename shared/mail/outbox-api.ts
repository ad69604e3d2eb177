/** Where a message is on its way out. */
export const OUTBOX_STATES = ['queued', 'sending', 'sent', 'failed', 'abandoned'] as const;
export type OutboxState = (typeof OUTBOX_STATES)[number];

/** The kinds of message the app writes. */
export const MAIL_KINDS = ['invitation', 'password-reset', 'booking-confirmation', 'booking-reminder', 'dues-receipt', 'dues-overdue', 'dues-renewal', 'dues-lapsed-bookings'] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

export const OUTBOX_PATH = '/api/admin/mail';

/** One row of the outbox list (admin). */
export interface OutboxMessageSummary {
  id: number;
  kind: MailKind;
  recipient: string;
  subject: string;
  state: OutboxState;
  attempts: number;
  lastError: string | null;
  nextAttemptAt: string | null;
  sentAt: string | null;
  createdAt: string;
}

/** GET /api/admin/mail/:messageId: the message as it was (or will be) sent. */
export interface OutboxMessage extends OutboxMessageSummary {
  text: string;
  html: string;
}
