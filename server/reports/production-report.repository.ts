import { Knex } from 'knex';
import { BATCH_STATUSES, BatchStatus } from '@shared/batches';
import { BusyInterval } from '@shared/brew-plan';
import { ReportBatch, ReportKitItem } from '@shared/production-report';
import { STATUS_DATE_COLUMN } from '../batches/batch-mapping';

/** Reads for the production report: batches with their status dates, the fermenters, their holds. */
export const productionReportRepository = {
  /**
   * Every batch, with its measured fermenter litres when brew day recorded them. Status dates may be
   * entered after the fact, so none of them bounds which batches a month needs; a co-op keeps hundreds.
   */
  async batches(db: Knex): Promise<ReportBatch[]> {
    const rows = await db('batches')
      .leftJoin('brew_day_measurements', 'brew_day_measurements.batch_id', 'batches.id')
      .select('batches.*', 'brew_day_measurements.fermenter_litres as measured_litres');
    return rows.map((row) => ({
      id: row.id,
      name: row.name,
      litres: Number(row.measured_litres ?? row.planned_volume_litres),
      fermenterKitItemId: row.fermenter_kit_item_id,
      reached: Object.fromEntries(BATCH_STATUSES.map((s) => [s, (row[STATUS_DATE_COLUMN[s]] as Date | null)?.getTime() ?? null])) as Record<BatchStatus, number | null>,
    }));
  },

  async fermenters(db: Knex): Promise<ReportKitItem[]> {
    const rows = await db('kit_items').where({ kind: 'fermenter' }).orderBy('code');
    return rows.map((r) => ({ id: r.id, code: r.code, name: r.name, turnaroundHours: Number(r.turnaround_hours), retired: r.state === 'retired' }));
  },

  /** Live bookings and maintenance blocks of fermenters whose hold touches [from, to). */
  async holds(db: Knex, from: Date, to: Date): Promise<BusyInterval[]> {
    const rows = await db('bookings')
      .join('kit_items', 'kit_items.id', 'bookings.kit_item_id')
      .where('kit_items.kind', 'fermenter')
      .whereNull('bookings.cancelled_at')
      .where('bookings.starts_at', '<', to)
      .where('bookings.held_until', '>', from)
      .select('bookings.id', 'bookings.kit_item_id', 'bookings.purpose', 'bookings.starts_at', 'bookings.held_until');
    return rows.map((r) => ({
      kitItemId: r.kit_item_id,
      kind: r.purpose === 'maintenance' ? 'maintenance' : 'booking',
      start: r.starts_at.getTime(),
      end: r.held_until.getTime(),
      refId: r.id,
      label: `booking #${r.id}`,
    }));
  },
};
