import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { KitItem, KitItemInput, KitItemSummary, MaintenanceEntry, MaintenanceEntryInput } from '@shared/kit';
import { recordAudit } from '../audit/audit-log.repository';
import { AppError } from '../errors/app-error';
import { kitRepository } from './kit.repository';

const itemNotFound = () => new AppError('kit-item-not-found', 'The kit register has no item with this id.', 404);
const codeTaken = (code: string) => new AppError('kit-code-taken', `Another item is already labelled ${code}.`, 409, { code: 'is already used by another item' });

/** The kit register: everyone reads it, admins keep it and its maintenance log. */
export function createKitService(db: Knex) {
  async function get(id: number): Promise<KitItem> {
    const item = await kitRepository.findById(db, id);
    if (!item) throw itemNotFound();
    return item;
  }

  return {
    get,

    list(): Promise<KitItemSummary[]> {
      return kitRepository.list(db);
    },

    async create(user: SessionUser, input: KitItemInput): Promise<KitItem> {
      if (await kitRepository.codeTaken(db, input.code)) throw codeTaken(input.code);
      const id = await db.transaction(async (trx) => {
        const newId = await kitRepository.insert(trx, input);
        await recordAudit(trx, { actorUserId: user.id, action: 'kit-item-created', subjectType: 'kit_item', subjectId: newId, detail: { ...input } });
        return newId;
      });
      return get(id);
    },

    /** Changes apply from now on; bookings already made keep the turnaround they were made with. */
    async update(user: SessionUser, id: number, changes: Partial<KitItemInput>): Promise<KitItem> {
      await get(id);
      if (changes.code && (await kitRepository.codeTaken(db, changes.code, id))) throw codeTaken(changes.code);
      await db.transaction(async (trx) => {
        await kitRepository.update(trx, id, changes);
        await recordAudit(trx, { actorUserId: user.id, action: 'kit-item-updated', subjectType: 'kit_item', subjectId: id, detail: { ...changes } });
      });
      return get(id);
    },

    async maintenanceLog(id: number): Promise<MaintenanceEntry[]> {
      await get(id);
      return kitRepository.listMaintenance(db, id);
    },

    async recordMaintenance(user: SessionUser, id: number, input: MaintenanceEntryInput): Promise<MaintenanceEntry> {
      await get(id);
      const entryId = await db.transaction(async (trx) => {
        const newId = await kitRepository.insertMaintenance(trx, id, input, user.id);
        await recordAudit(trx, { actorUserId: user.id, action: 'kit-maintenance-recorded', subjectType: 'kit_item', subjectId: id, detail: { entryId: newId } });
        return newId;
      });
      const log = await kitRepository.listMaintenance(db, id);
      return log.find((entry) => entry.id === entryId)!;
    },
  };
}

export type KitService = ReturnType<typeof createKitService>;
