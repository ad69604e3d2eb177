import { Knex } from 'knex';
import { KitItem, KitItemInput, KitItemSummary, MaintenanceEntry, MaintenanceEntryInput } from '@shared/kit';
import { KitItemRow, KitMaintenanceEntryRow } from '../db';

/** A DATE column as yyyy-MM-dd (the driver returns midnight UTC). */
export function calendarDay(value: Date | string | null): string | null {
  if (value === null) return null;
  return typeof value === 'string' ? value.slice(0, 10) : value.toISOString().slice(0, 10);
}

function toKitItem(row: KitItemRow): KitItem {
  return {
    id: row.id,
    code: row.code,
    name: row.name,
    kind: row.kind,
    capacityLitres: row.capacity_litres === null ? null : Number(row.capacity_litres),
    state: row.state,
    turnaroundHours: row.turnaround_hours,
    notes: row.notes,
  };
}

function toColumns(input: Partial<KitItemInput>) {
  return {
    ...(input.code !== undefined ? { code: input.code } : {}),
    ...(input.name !== undefined ? { name: input.name } : {}),
    ...(input.kind !== undefined ? { kind: input.kind } : {}),
    ...(input.capacityLitres !== undefined ? { capacity_litres: input.capacityLitres } : {}),
    ...(input.state !== undefined ? { state: input.state } : {}),
    ...(input.turnaroundHours !== undefined ? { turnaround_hours: input.turnaroundHours } : {}),
    ...(input.notes !== undefined ? { notes: input.notes } : {}),
  };
}

type EntryRecord = KitMaintenanceEntryRow & { recorded_by_name: string };

function toEntry(row: EntryRecord): MaintenanceEntry {
  return {
    id: row.id,
    kitItemId: row.kit_item_id,
    performedOn: calendarDay(row.performed_on)!,
    work: row.work,
    performedBy: row.performed_by,
    nextDueOn: calendarDay(row.next_due_on),
    recordedByName: row.recorded_by_name,
    createdAt: row.created_at.toISOString(),
  };
}

/** Data access for the kit register and its maintenance log. */
export const kitRepository = {
  async list(db: Knex): Promise<KitItemSummary[]> {
    const nextDue = db('kit_maintenance_entries as m')
      .whereRaw('m.kit_item_id = kit_items.id')
      .orderBy('m.performed_on', 'desc')
      .orderBy('m.id', 'desc')
      .limit(1)
      .select('m.next_due_on');
    const rows = await db('kit_items').select('kit_items.*', nextDue.as('next_due_on')).orderBy('kit_items.code');
    return rows.map((row: KitItemRow & { next_due_on: Date | null }) => ({ ...toKitItem(row), nextMaintenanceDueOn: calendarDay(row.next_due_on) }));
  },

  async findById(db: Knex, id: number, lock = false): Promise<KitItem | null> {
    const query = db('kit_items').where({ id });
    if (lock) query.forUpdate();
    const row = await query.first();
    return row ? toKitItem(row) : null;
  },

  async codeTaken(db: Knex, code: string, exceptId?: number): Promise<boolean> {
    const query = db('kit_items').where({ code });
    if (exceptId) query.whereNot({ id: exceptId });
    return (await query.first('id')) !== undefined;
  },

  async insert(db: Knex, input: KitItemInput): Promise<number> {
    const [id] = await db('kit_items').insert({
      code: input.code,
      name: input.name,
      kind: input.kind,
      capacity_litres: input.capacityLitres,
      state: input.state,
      turnaround_hours: input.turnaroundHours,
      notes: input.notes,
    });
    return id;
  },

  async update(db: Knex, id: number, changes: Partial<KitItemInput>): Promise<void> {
    await db('kit_items').where({ id }).update({ ...toColumns(changes), updated_at: new Date() });
  },

  async listMaintenance(db: Knex, kitItemId: number): Promise<MaintenanceEntry[]> {
    const rows = await db('kit_maintenance_entries')
      .join('users', 'users.id', 'kit_maintenance_entries.recorded_by_user_id')
      .where('kit_maintenance_entries.kit_item_id', kitItemId)
      .orderBy('kit_maintenance_entries.performed_on', 'desc')
      .orderBy('kit_maintenance_entries.id', 'desc')
      .select('kit_maintenance_entries.*', 'users.name as recorded_by_name');
    return rows.map(toEntry);
  },

  async insertMaintenance(db: Knex, kitItemId: number, input: MaintenanceEntryInput, userId: number): Promise<number> {
    const [id] = await db('kit_maintenance_entries').insert({
      kit_item_id: kitItemId,
      performed_on: input.performedOn,
      work: input.work,
      performed_by: input.performedBy,
      next_due_on: input.nextDueOn,
      recorded_by_user_id: userId,
    });
    return id;
  },
};
