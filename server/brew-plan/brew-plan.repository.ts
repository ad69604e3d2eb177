import { Knex } from 'knex';
import { BrewSchedule } from '@shared/brew-plan';

/** The fermenter booking made for a batch, as the plan reads it. */
export interface LinkedBooking {
  id: number;
  batchId: number;
  kitItemId: number;
  startsAt: Date;
  endsAt: Date;
  heldUntil: Date;
}

/** Data access for the brew plan's own rows: the schedules batches were planned with, and their bookings. */
export const brewPlanRepository = {
  async schedulesOf(db: Knex, batchIds: readonly number[]): Promise<Map<number, BrewSchedule>> {
    if (!batchIds.length) return new Map();
    const rows = await db('batch_plans').whereIn('batch_id', batchIds);
    return new Map(rows.map((r) => [r.batch_id, { fermentationDays: r.fermentation_days, conditioningDays: r.conditioning_days }]));
  },

  async saveSchedule(trx: Knex.Transaction, batchId: number, schedule: BrewSchedule): Promise<void> {
    await trx('batch_plans')
      .insert({ batch_id: batchId, fermentation_days: schedule.fermentationDays, conditioning_days: schedule.conditioningDays })
      .onConflict('batch_id')
      .merge({ fermentation_days: schedule.fermentationDays, conditioning_days: schedule.conditioningDays, updated_at: new Date() });
  },

  /** Each batch's live fermenter booking (the latest, if several). */
  async linkedBookings(db: Knex, batchIds: readonly number[]): Promise<Map<number, LinkedBooking>> {
    if (!batchIds.length) return new Map();
    const rows = await db('bookings')
      .whereIn('batch_id', batchIds)
      .where({ purpose: 'use' })
      .whereNull('cancelled_at')
      .orderBy('id')
      .select('id', 'batch_id', 'kit_item_id', 'starts_at', 'ends_at', 'held_until');
    return new Map(rows.map((r) => [r.batch_id!, { id: r.id, batchId: r.batch_id!, kitItemId: r.kit_item_id, startsAt: r.starts_at, endsAt: r.ends_at, heldUntil: r.held_until }]));
  },
};
