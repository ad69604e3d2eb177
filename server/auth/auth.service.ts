import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { recordAudit } from '../audit/audit-log.repository';
import { UserRecord, usersRepository } from '../users/users.repository';
import { PasswordHasher } from './password-hasher';

/** What a session may carry about a person. */
export function toSessionUser(user: UserRecord): SessionUser {
  return { id: user.id, email: user.email, name: user.name, roles: user.roles };
}

/** Sign-in rules: credentials, active accounts, and who a session belongs to. */
export function createAuthService(db: Knex, hasher: PasswordHasher) {
  return {
    /** The person when e-mail and password match an active account; null otherwise (never says which part failed). */
    async verifyCredentials(email: string, password: string): Promise<SessionUser | null> {
      const found = await usersRepository.findCredentials(db, email);
      if (!found) return hasher.verifyNothing(password).then(() => null);
      const matches = await hasher.verify(password, found.passwordHash);
      if (!matches || !found.user.active) return null;
      // Brings hashes made at an older cost up to the current one, so every check costs the same.
      if (hasher.needsRehash(found.passwordHash)) await usersRepository.update(db, found.user.id, { password_hash: await hasher.hash(password) });
      return toSessionUser(found.user);
    },

    /** The session's person, re-read on every request so role changes and deactivation apply at once. */
    async loadSessionUser(id: number): Promise<SessionUser | null> {
      return usersRepository.findActiveSessionUser(db, id);
    },

    async recordSignIn(user: SessionUser, ip: string): Promise<void> {
      await recordAudit(db, { actorUserId: user.id, action: 'sign-in', subjectType: 'user', subjectId: user.id, detail: { ip } });
    },
  };
}

export type AuthService = ReturnType<typeof createAuthService>;
