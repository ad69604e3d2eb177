import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { ToleranceClass, ToleranceClassInput } from '@shared/strength-check';
import { recordAudit } from '../audit/audit-log.repository';
import { AppError } from '../errors/app-error';
import { toleranceClassesRepository as repo } from './tolerance-classes.repository';

const nameTaken = () => new AppError('name-taken', 'A product class already has this name.', 409, { name: 'is already taken' });
const isDuplicate = (error: unknown) => (error as { code?: string }).code === 'ER_DUP_ENTRY';

/** Product classes and their tolerances: everyone reads them, admins keep them. */
export function createToleranceClassesService(db: Knex) {
  async function write(user: SessionUser, action: string, run: (trx: Knex) => Promise<number>): Promise<ToleranceClass> {
    try {
      const id = await db.transaction(async (trx) => {
        const classId = await run(trx);
        await recordAudit(trx, { actorUserId: user.id, action, subjectType: 'tolerance_class', subjectId: classId });
        return classId;
      });
      return (await repo.find(db, id))!;
    } catch (error) {
      if (isDuplicate(error)) throw nameTaken();
      throw error;
    }
  }

  return {
    list: (includeRetired: boolean) => repo.list(db, includeRetired),
    find: (id: number) => repo.find(db, id),

    create(user: SessionUser, input: ToleranceClassInput): Promise<ToleranceClass> {
      return write(user, 'tolerance-class-added', (trx) => repo.insert(trx, input));
    },

    async update(user: SessionUser, id: number, input: ToleranceClassInput): Promise<ToleranceClass> {
      if (!(await repo.find(db, id))) throw new AppError('tolerance-class-not-found', 'No product class has this id.', 404);
      return write(user, 'tolerance-class-changed', async (trx) => {
        await repo.update(trx, id, input);
        return id;
      });
    },
  };
}

export type ToleranceClassesService = ReturnType<typeof createToleranceClassesService>;
