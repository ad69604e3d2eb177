import { Knex } from 'knex';
import { StyleTarget, StyleTargetInput } from '@shared/recipes';
import { recordAudit } from '../audit/audit-log.repository';
import { AppError } from '../errors/app-error';
import { stylesRepository } from './styles.repository';

async function uniqueName<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if ((error as { code?: string }).code === 'ER_DUP_ENTRY') throw new AppError('name-taken', 'A style with this name exists.', 409, { name: 'is already used' });
    throw error;
  }
}

/** The co-op's own style list: brewers and admins keep it; names are unique. */
export function createStylesService(db: Knex) {
  return {
    list: () => stylesRepository.list(db),

    async create(actorId: number, input: StyleTargetInput): Promise<StyleTarget> {
      const id = await uniqueName(() =>
        db.transaction(async (trx) => {
          const newId = await stylesRepository.insert(trx, input);
          await recordAudit(trx, { actorUserId: actorId, action: 'style-added', subjectType: 'style_target', subjectId: newId });
          return newId;
        }),
      );
      return (await stylesRepository.findById(db, id))!;
    },

    async update(actorId: number, id: number, input: StyleTargetInput): Promise<StyleTarget> {
      if (!(await stylesRepository.findById(db, id))) throw new AppError('style-not-found', 'No style has this id.', 404);
      await uniqueName(() =>
        db.transaction(async (trx) => {
          await stylesRepository.update(trx, id, input);
          await recordAudit(trx, { actorUserId: actorId, action: 'style-changed', subjectType: 'style_target', subjectId: id });
        }),
      );
      return (await stylesRepository.findById(db, id))!;
    },
  };
}

export type StylesService = ReturnType<typeof createStylesService>;
