import { Knex } from 'knex';
import { Role } from '@shared/auth';
import { Member, MemberListResponse, UpdateMemberRequest } from '@shared/members';
import { recordAudit } from '../audit/audit-log.repository';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { AppError } from '../errors/app-error';
import { invitationsRepository } from '../invitations/invitations.repository';
import { InvitationsService } from '../invitations/invitations.service';
import { passwordResetsRepository } from '../password-resets/password-resets.repository';
import { UserRecord, usersRepository } from '../users/users.repository';

function toMember(user: UserRecord): Member {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    roles: user.roles,
    active: user.active,
    createdAt: user.createdAt.toISOString(),
    passwordResetRequestedAt: user.passwordResetRequestedAt?.toISOString() ?? null,
  };
}

const lastAdmin = () =>
  new AppError('last-admin', 'The co-op must keep at least one active admin: make someone else admin first.', 409);

/** The officers' view of people: list, roles, (de)activation, with the last-admin rule. */
export function createMembersService(db: Knex, invitations: InvitationsService) {
  return {
    async list(): Promise<MemberListResponse> {
      const [users, pending] = await Promise.all([usersRepository.list(db), invitations.listPending()]);
      return { members: users.map(toMember), invitations: pending };
    },

    /** Applies role and activity changes; refuses one that would leave no active admin. */
    async update(actorId: number, memberId: number, changes: UpdateMemberRequest): Promise<Member> {
      await transactionWithRetry(db, async (trx) => {
        const activeAdmins = await usersRepository.lockActiveAdminIds(trx);
        const member = await usersRepository.findById(trx, memberId);
        if (!member) throw new AppError('member-not-found', 'No member has this id.', 404);
        const roles: Role[] = changes.roles ?? member.roles;
        const active = changes.active ?? member.active;
        const staysAdmin = active && roles.includes('admin');
        if (!staysAdmin && activeAdmins.length === 1 && activeAdmins[0] === memberId) throw lastAdmin();
        if (changes.roles) await usersRepository.replaceRoles(trx, memberId, roles);
        if (changes.active !== undefined) await usersRepository.update(trx, memberId, { active });
        if (changes.active === false) {
          // A deactivated person's links die with the account: reset links for or by them, invitations they sent.
          const at = new Date();
          await passwordResetsRepository.withdrawFor(trx, memberId, at);
          await invitationsRepository.revokePendingOf(trx, memberId, member.email, at);
        }
        await recordAudit(trx, { actorUserId: actorId, action: 'member-updated', subjectType: 'user', subjectId: memberId, detail: { ...changes } });
      });
      return toMember((await usersRepository.findById(db, memberId))!);
    },
  };
}

export type MembersService = ReturnType<typeof createMembersService>;
