import { Knex } from 'knex';
import { z } from 'zod';
import { UNIT_SYSTEMS, UserPreferences } from '@shared/recipes';
import { recordAudit } from '../audit/audit-log.repository';
import { parseRequest } from '../http/parse-request';
import { usersRepository } from '../users/users.repository';

const preferencesSchema = z.object({ unitSystem: z.enum(UNIT_SYSTEMS, `must be one of ${UNIT_SYSTEMS.join(', ')}`) });

/** A person's own display settings. */
export function createPreferencesService(db: Knex) {
  return {
    async load(userId: number): Promise<UserPreferences> {
      return { unitSystem: await usersRepository.unitSystem(db, userId) };
    },

    async save(userId: number, body: unknown): Promise<UserPreferences> {
      const preferences = parseRequest(preferencesSchema, body);
      // The change and its audit entry share one transaction, as the profile page's change of units does.
      await db.transaction(async (trx) => {
        await usersRepository.update(trx, userId, { unit_system: preferences.unitSystem });
        await recordAudit(trx, { actorUserId: userId, action: 'preferences-changed', subjectType: 'user', subjectId: userId, detail: preferences });
      });
      return preferences;
    },
  };
}

export type PreferencesService = ReturnType<typeof createPreferencesService>;
