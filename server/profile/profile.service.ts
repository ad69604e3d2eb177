import { Knex } from 'knex';
import { ChangePasswordRequest, Profile, UpdateProfileRequest } from '@shared/profile';
import { recordAudit } from '../audit/audit-log.repository';
import { PasswordHasher } from '../auth/password-hasher';
import { sessionsRepository } from '../auth/sessions.repository';
import { AppError } from '../errors/app-error';
import { usersRepository } from '../users/users.repository';

function currentPasswordWrong(): AppError {
  return new AppError('validation-failed', 'Please check these fields: currentPassword.', 400, { currentPassword: 'does not match your password' });
}

/** The signed-in person's own name, units and password. */
export function createProfileService(deps: { db: Knex; hasher: PasswordHasher }) {
  const { db, hasher } = deps;

  async function load(userId: number): Promise<Profile> {
    const user = await usersRepository.findById(db, userId);
    if (!user) throw new AppError('member-not-found', 'Your account no longer exists.', 404);
    return { name: user.name, email: user.email, unitSystem: await usersRepository.unitSystem(db, userId) };
  }

  return {
    load,

    async update(userId: number, changes: UpdateProfileRequest): Promise<Profile> {
      await db.transaction(async (trx) => {
        await usersRepository.update(trx, userId, { name: changes.name, unit_system: changes.unitSystem });
        await recordAudit(trx, { actorUserId: userId, action: 'profile-changed', subjectType: 'user', subjectId: userId });
      });
      return load(userId);
    },

    /** Checks the current password, sets the new one and ends every other session of the person. */
    async changePassword(userId: number, sessionId: string, request: ChangePasswordRequest): Promise<void> {
      const user = await usersRepository.findById(db, userId);
      const found = user && (await usersRepository.findCredentials(db, user.email));
      if (!found || !(await hasher.verify(request.currentPassword, found.passwordHash))) throw currentPasswordWrong();
      const passwordHash = await hasher.hash(request.newPassword);
      await db.transaction(async (trx) => {
        await usersRepository.update(trx, userId, { password_hash: passwordHash });
        const ended = await sessionsRepository.endOthers(trx, userId, sessionId);
        await recordAudit(trx, { actorUserId: userId, action: 'password-changed', subjectType: 'user', subjectId: userId, detail: { endedSessions: ended } });
      });
    },
  };
}

export type ProfileService = ReturnType<typeof createProfileService>;
