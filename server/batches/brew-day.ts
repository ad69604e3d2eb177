import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { BrewDayMeasurements } from '@shared/batches';
import { recordAudit } from '../audit/audit-log.repository';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { assertMayEditBatch, batchNotFound } from './batch-access';
import { batchesRepository } from './batches.repository';

/** Stores the brew day's measurements (all of them, as entered), audited with the previous figures. */
export async function saveBrewDay(db: Knex, user: SessionUser, id: number, measured: BrewDayMeasurements): Promise<void> {
  await transactionWithRetry(db, async (trx) => {
    const row = await batchesRepository.lock(trx, id);
    if (!row) throw batchNotFound();
    assertMayEditBatch(user, row);
    const before = await batchesRepository.brewDay(trx, id);
    await batchesRepository.saveBrewDay(trx, id, {
      pre_boil_litres: measured.preBoilLitres,
      pre_boil_gravity: measured.preBoilGravity,
      fermenter_litres: measured.fermenterLitres,
      original_gravity: measured.originalGravity,
      original_gravity_temperature_c: measured.originalGravityTemperatureC,
      pitched_at: measured.pitchedAt ? new Date(measured.pitchedAt) : null,
      updated_by_user_id: user.id,
    } as never);
    await recordAudit(trx, { actorUserId: user.id, action: 'brew-day-saved', subjectType: 'batch', subjectId: id, detail: { before: before ?? null, after: { ...measured } } });
  });
}
