import { Knex } from 'knex';

/** One entry of the audit log: who did what to which record. */
export interface AuditEntry {
  actorUserId: number | null;
  action: string;
  subjectType: string;
  subjectId: number | null;
  detail?: Record<string, unknown>;
}

/** Appends an entry; pass the transaction so the entry commits with the change it records. */
export async function recordAudit(db: Knex, entry: AuditEntry): Promise<void> {
  await db('audit_log').insert({
    actor_user_id: entry.actorUserId,
    action: entry.action,
    subject_type: entry.subjectType,
    subject_id: entry.subjectId,
    detail: entry.detail ? JSON.stringify(entry.detail) : null,
  });
}
