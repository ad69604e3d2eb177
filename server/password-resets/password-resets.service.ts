import { Knex } from 'knex';
import { IssuedPasswordReset } from '@shared/members';
import { recordAudit } from '../audit/audit-log.repository';
import { createOneTimeToken, hashOneTimeToken } from '../auth/one-time-token';
import { PasswordHasher } from '../auth/password-hasher';
import { AppError } from '../errors/app-error';
import { outboxRepository } from '../mail/outbox.repository';
import { passwordResetMail } from '../mail/templates/account-mails';
import { usersRepository } from '../users/users.repository';
import { passwordResetsRepository } from './password-resets.repository';

const RESET_HOURS = 24;

const resetLinkInvalid = () => new AppError('reset-link-invalid', 'This reset link is not valid: it may have expired or been used.', 404);

/** Forgotten passwords: a request mails the member a one-time link (and is noted for the officers, who can also hand out a link). */
export function createPasswordResetsService(deps: { db: Knex; hasher: PasswordHasher; publicUrl: string; now?: () => Date }) {
  const { db, hasher } = deps;
  const now = deps.now ?? (() => new Date());

  return {
    /** Mails a one-time link when the e-mail belongs to an active member; says nothing either way. */
    async request(email: string): Promise<void> {
      const found = await usersRepository.findCredentials(db, email);
      if (!found?.user.active) return;
      const { user } = found;
      const { token, hash } = createOneTimeToken();
      const expiresAt = new Date(now().getTime() + RESET_HOURS * 3600 * 1000);
      await db.transaction(async (trx) => {
        await usersRepository.update(trx, user.id, { password_reset_requested_at: now() });
        await passwordResetsRepository.replace(trx, { user_id: user.id, token_hash: hash, issued_by_user_id: null, expires_at: expiresAt }, now());
        const content = passwordResetMail({ name: user.name, link: `${deps.publicUrl}/reset-password/${token}`, expiresAt });
        await outboxRepository.enqueue(trx, { kind: 'password-reset', to: user.email, ...content });
        await recordAudit(trx, { actorUserId: null, action: 'password-reset-requested', subjectType: 'user', subjectId: user.id });
      });
    },

    /** An officer issues a one-time link to hand to the member. */
    async issue(actorId: number, userId: number): Promise<IssuedPasswordReset> {
      const user = await usersRepository.findById(db, userId);
      if (!user?.active) throw new AppError('member-not-found', 'No active member has this id.', 404);
      const { token, hash } = createOneTimeToken();
      const expiresAt = new Date(now().getTime() + RESET_HOURS * 3600 * 1000);
      await db.transaction(async (trx) => {
        await passwordResetsRepository.replace(trx, { user_id: userId, token_hash: hash, issued_by_user_id: actorId, expires_at: expiresAt }, now());
        await recordAudit(trx, { actorUserId: actorId, action: 'password-reset-issued', subjectType: 'user', subjectId: userId });
      });
      return { link: `${deps.publicUrl}/reset-password/${token}`, expiresAt: expiresAt.toISOString() };
    },

    /**
     * Sets the new password, spends the token and ends the member's other sessions. The token (and
     * that its member is still active) is checked before hashing, so made-up tokens cost no hashing.
     */
    async complete(token: string, password: string): Promise<void> {
      const tokenHash = hashOneTimeToken(token);
      if (!(await passwordResetsRepository.findUsable(db, tokenHash, now()))) throw resetLinkInvalid();
      const passwordHash = await hasher.hash(password);
      await db.transaction(async (trx) => {
        const row = await passwordResetsRepository.findUsable(trx, tokenHash, now(), true);
        if (!row) throw resetLinkInvalid();
        await usersRepository.update(trx, row.user_id, { password_hash: passwordHash, password_reset_requested_at: null });
        await passwordResetsRepository.markUsed(trx, row.id, now());
        await passwordResetsRepository.endSessionsOf(trx, row.user_id);
        await recordAudit(trx, { actorUserId: row.user_id, action: 'password-reset-completed', subjectType: 'user', subjectId: row.user_id });
      });
    },
  };
}

export type PasswordResetsService = ReturnType<typeof createPasswordResetsService>;
