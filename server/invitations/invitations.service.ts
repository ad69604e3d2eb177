import { Knex } from 'knex';
import { AcceptInvitationRequest, InvitationPreview, Role, SessionUser } from '@shared/auth';
import { Invitation } from '@shared/members';
import { recordAudit } from '../audit/audit-log.repository';
import { createOneTimeToken, hashOneTimeToken } from '../auth/one-time-token';
import { PasswordHasher } from '../auth/password-hasher';
import { toSessionUser } from '../auth/auth.service';
import { AppError } from '../errors/app-error';
import { outboxRepository } from '../mail/outbox.repository';
import { invitationMail } from '../mail/templates/account-mails';
import { usersRepository } from '../users/users.repository';
import { invitationsRepository } from './invitations.repository';

const INVITATION_DAYS = 7;

const invitationNotFound = () =>
  new AppError('invitation-not-found', 'This invitation link is not valid: it may have expired, been used or been withdrawn.', 404);

/** Invitations: officers invite by e-mail; the invited person joins by setting a name and password. */
export function createInvitationsService(deps: { db: Knex; hasher: PasswordHasher; publicUrl: string; now?: () => Date }) {
  const { db, hasher } = deps;
  const now = deps.now ?? (() => new Date());

  return {
    listPending: () => invitationsRepository.listPending(db, now()),

    /** Creates an invitation (withdrawing older ones to the same address), mails it, and returns it with its link. */
    async create(actorId: number, email: string, roles: Role[]): Promise<Invitation> {
      if (await usersRepository.emailTaken(db, email)) {
        throw new AppError('email-taken', 'Someone with this e-mail is already a member.', 409, { email: 'is already a member' });
      }
      const { token, hash } = createOneTimeToken();
      const expiresAt = new Date(now().getTime() + INVITATION_DAYS * 24 * 3600 * 1000);
      const link = `${deps.publicUrl}/invitations/${token}`;
      const inviter = await usersRepository.findById(db, actorId);
      const id = await db.transaction(async (trx) => {
        await invitationsRepository.revokePendingForEmail(trx, email, now());
        const newId = await invitationsRepository.insert(trx, { email, roles, token_hash: hash, invited_by_user_id: actorId, expires_at: expiresAt });
        await outboxRepository.enqueue(trx, { kind: 'invitation', to: email, ...invitationMail({ link, expiresAt, invitedBy: inviter?.name ?? 'An officer of the co-op' }) });
        await recordAudit(trx, { actorUserId: actorId, action: 'invitation-created', subjectType: 'invitation', subjectId: newId, detail: { email, roles } });
        return newId;
      });
      const invitation = await invitationsRepository.findPendingById(db, id, now());
      return { ...invitation!, link };
    },

    async revoke(actorId: number, id: number): Promise<void> {
      const invitation = await invitationsRepository.findPendingById(db, id, now());
      if (!invitation) throw new AppError('invitation-not-found', 'No pending invitation has this id.', 404);
      await invitationsRepository.update(db, id, { revoked_at: now() });
      await recordAudit(db, { actorUserId: actorId, action: 'invitation-revoked', subjectType: 'invitation', subjectId: id });
    },

    async preview(token: string): Promise<InvitationPreview> {
      const row = await invitationsRepository.findPendingByTokenHash(db, hashOneTimeToken(token), now());
      if (!row) throw invitationNotFound();
      return { email: row.email, roles: row.roles, expiresAt: row.expires_at.toISOString() };
    },

    /**
     * Turns the invitation into an account; the row lock makes a double submit create one account only.
     * The token is checked before the password is hashed, so made-up tokens cost no hashing.
     */
    async accept(token: string, request: AcceptInvitationRequest): Promise<SessionUser> {
      const tokenHash = hashOneTimeToken(token);
      if (!(await invitationsRepository.findPendingByTokenHash(db, tokenHash, now()))) throw invitationNotFound();
      const passwordHash = await hasher.hash(request.password);
      const userId = await db.transaction(async (trx) => {
        const row = await invitationsRepository.findPendingByTokenHash(trx, tokenHash, now(), true);
        if (!row) throw invitationNotFound();
        if (await usersRepository.emailTaken(trx, row.email)) throw invitationNotFound();
        const id = await usersRepository.create(trx, { email: row.email, name: request.name, passwordHash, roles: row.roles });
        await invitationsRepository.update(trx, row.id, { accepted_at: now() });
        await recordAudit(trx, { actorUserId: id, action: 'invitation-accepted', subjectType: 'user', subjectId: id });
        return id;
      });
      return toSessionUser((await usersRepository.findById(db, userId))!);
    },
  };
}

export type InvitationsService = ReturnType<typeof createInvitationsService>;
