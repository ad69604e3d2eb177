import { Knex } from 'knex';
import { BrewhouseSettings } from '@shared/recipes';
import { recordAudit } from '../audit/audit-log.repository';
import { parseRequest } from '../http/parse-request';
import { brewhouseSettingsSchema } from './brewhouse.schemas';
import { brewhouseRepository } from './brewhouse.repository';

/** The co-op's brewhouse settings: read by everyone, set by brewers and admins. */
export function createBrewhouseService(db: Knex) {
  return {
    async load(): Promise<BrewhouseSettings> {
      return brewhouseRepository.load(db);
    },

    /** Stores the settings and their audit entry together. */
    async save(actorId: number, body: unknown): Promise<BrewhouseSettings> {
      const settings = parseRequest(brewhouseSettingsSchema, body);
      await db.transaction(async (trx) => {
        await brewhouseRepository.save(trx, settings, actorId);
        await recordAudit(trx, { actorUserId: actorId, action: 'brewhouse-changed', subjectType: 'brewhouse', subjectId: 1 });
      });
      return settings;
    },
  };
}

export type BrewhouseService = ReturnType<typeof createBrewhouseService>;
