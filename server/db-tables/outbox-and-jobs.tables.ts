import { Knex } from 'knex';

// E-mail waiting to be sent and the leases of scheduled jobs.

export interface OutboxMessageRow {
  id: number;
  kind: string;
  recipient: string;
  subject: string;
  text_body: string;
  html_body: string;
  state: 'queued' | 'sending' | 'sent' | 'failed' | 'abandoned';
  attempts: number;
  next_attempt_at: Date;
  claimed_by: string | null;
  claim_expires_at: Date | null;
  last_error: string | null;
  sent_at: Date | null;
  dedupe_key: string | null;
  created_at: Date;
}

export interface JobLeaseRow {
  name: string;
  holder: string | null;
  lease_until: Date;
  last_run_at: Date | null;
}

declare module 'knex/types/tables' {
  interface Tables {
    outbox_messages: Knex.CompositeTableType<OutboxMessageRow, Pick<OutboxMessageRow, 'kind' | 'recipient' | 'subject' | 'text_body' | 'html_body'> & { dedupe_key?: string | null }, Partial<OutboxMessageRow>>;
    job_leases: JobLeaseRow;
  }
}
