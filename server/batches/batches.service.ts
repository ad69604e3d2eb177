import { Knex } from 'knex';
import { hasAnyRole, SessionUser } from '@shared/auth';
import { ACTIVE_STATUSES, Batch, BrewerChoice, BatchSummary, CreateBatchRequest, FermenterChoice, FERMENTER_HOLDING_STATUSES, UpdateBatchRequest } from '@shared/batches';
import { recordAudit } from '../audit/audit-log.repository';
import { AppError, forbidden } from '../errors/app-error';
import { RecipesService } from '../recipes';
import { usersRepository } from '../users/users.repository';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { assertMayEditBatch, batchNotFound, mayEditBatch } from './batch-access';
import { toBatch, toBatchSummary } from './batch-mapping';
import { BatchRecord, batchesRepository } from './batches.repository';
import { checkFermenter } from './fermenter-check';

/** Batches: anyone starts one for themselves; brewers and admins may start one for another member. */
export function createBatchesService(db: Knex, recipes: RecipesService) {
  async function record(id: number): Promise<BatchRecord> {
    const found = await batchesRepository.findById(db, id);
    if (!found) throw batchNotFound();
    return found;
  }

  async function assertBrewer(user: SessionUser, brewerId: number): Promise<void> {
    if (brewerId === user.id) return;
    if (!hasAnyRole(user.roles, ['brewer', 'admin'])) throw forbidden('Only brewers and admins may start a batch for someone else.');
    const brewer = await usersRepository.findById(db, brewerId);
    if (!brewer?.active) throw new AppError('validation-failed', 'Please check these fields: brewerId.', 400, { brewerId: 'must be an active member' });
  }

  return {
    /** One batch as its page shows it. */
    async get(user: SessionUser, id: number): Promise<Batch> {
      const found = await record(id);
      const points = await batchesRepository.gravityPoints(db, [id]);
      return toBatch(found, points.get(id)!, mayEditBatch(user, found));
    },

    /** Every co-op batch, or the caller's active ones (Today). */
    async list(user: SessionUser, mine: boolean): Promise<BatchSummary[]> {
      const rows = await batchesRepository.list(db, mine ? { brewerId: user.id, statuses: ACTIVE_STATUSES } : {});
      const points = await batchesRepository.gravityPoints(db, rows.map((r) => r.id));
      return rows.map((r) => toBatchSummary(r, points.get(r.id)!));
    },

    /** Active members, by name: whom a batch's brewer may be changed to. */
    async brewers(): Promise<BrewerChoice[]> {
      return (await usersRepository.list(db)).filter((u) => u.active).map((u) => ({ id: u.id, name: u.name }));
    },

    async fermenters(): Promise<FermenterChoice[]> {
      return (await batchesRepository.listFermenters(db)).map((f) => ({
        id: f.id, code: f.code, name: f.name, capacityLitres: f.capacity_litres === null ? null : Number(f.capacity_litres), heldByBatchId: f.held_by_batch_id,
      }));
    },

    /** Starts a batch in "planned", copying the recipe version's predictions into it. */
    async create(user: SessionUser, request: CreateBatchRequest): Promise<Batch> {
      const brewerId = request.brewerId ?? user.id;
      await assertBrewer(user, brewerId);
      const version = request.recipeId !== null && request.recipeVersion !== null ? await recipes.versionPrediction(user, request.recipeId, request.recipeVersion) : null;
      const id = await transactionWithRetry(db, async (trx) => {
        const newId = await batchesRepository.insert(trx, {
          name: request.name, brewer_user_id: brewerId, created_by_user_id: user.id, recipe_id: request.recipeId, recipe_version: request.recipeVersion,
          predicted: version?.prediction ?? null, brew_date: new Date(`${request.brewDate}T00:00:00Z`), planned_volume_litres: request.plannedVolumeLitres,
          fermenter_kit_item_id: request.fermenterId, notes: request.notes ?? '',
        });
        if (request.fermenterId !== null) await checkFermenter(trx, request.fermenterId, newId, null);
        await recordAudit(trx, { actorUserId: user.id, action: 'batch-created', subjectType: 'batch', subjectId: newId, detail: { recipeId: request.recipeId, recipeVersion: request.recipeVersion } });
        return newId;
      });
      return this.get(user, id);
    },

    async update(user: SessionUser, id: number, changes: UpdateBatchRequest): Promise<Batch> {
      assertMayEditBatch(user, await record(id));
      if (changes.brewerId !== undefined) await assertBrewer(user, changes.brewerId);
      await transactionWithRetry(db, async (trx) => {
        const row = await batchesRepository.lock(trx, id);
        if (!row) throw batchNotFound();
        if (changes.fermenterId) await checkFermenter(trx, changes.fermenterId, id, FERMENTER_HOLDING_STATUSES.includes(row.status) ? new Date() : null);
        await batchesRepository.update(trx, id, {
          ...(changes.name !== undefined ? { name: changes.name } : {}),
          ...(changes.brewerId !== undefined ? { brewer_user_id: changes.brewerId } : {}),
          ...(changes.brewDate !== undefined ? { brew_date: new Date(`${changes.brewDate}T00:00:00Z`) } : {}),
          ...(changes.plannedVolumeLitres !== undefined ? { planned_volume_litres: changes.plannedVolumeLitres } : {}),
          ...(changes.fermenterId !== undefined ? { fermenter_kit_item_id: changes.fermenterId } : {}),
          ...(changes.notes !== undefined ? { notes: changes.notes } : {}),
        });
        await recordAudit(trx, { actorUserId: user.id, action: 'batch-updated', subjectType: 'batch', subjectId: id, detail: { ...changes } });
      });
      return this.get(user, id);
    },
  };
}

export type BatchesService = ReturnType<typeof createBatchesService>;
