import { Knex } from 'knex';
import { ToleranceClass, ToleranceClassInput } from '@shared/strength-check';
import { ToleranceClassRow } from '../db';

function toClass(row: ToleranceClassRow): ToleranceClass {
  return { id: row.id, name: row.name, tolerancePercentVolume: Number(row.tolerance_percent_volume), note: row.note, retired: Boolean(row.retired) };
}

/** Data access for the admins' product classes and their tolerances. */
export const toleranceClassesRepository = {
  async list(db: Knex, includeRetired: boolean): Promise<ToleranceClass[]> {
    const query = db('tolerance_classes').orderBy('name');
    if (!includeRetired) query.where({ retired: false });
    return (await query).map(toClass);
  },

  async find(db: Knex, id: number): Promise<ToleranceClass | null> {
    const row = await db('tolerance_classes').where({ id }).first();
    return row ? toClass(row) : null;
  },

  async insert(db: Knex, input: ToleranceClassInput): Promise<number> {
    const [id] = await db('tolerance_classes').insert({ name: input.name, tolerance_percent_volume: input.tolerancePercentVolume, note: input.note });
    return id;
  },

  async update(db: Knex, id: number, input: ToleranceClassInput): Promise<void> {
    await db('tolerance_classes').where({ id }).update({
      name: input.name, tolerance_percent_volume: input.tolerancePercentVolume, note: input.note,
      ...(input.retired === undefined ? {} : { retired: input.retired }), updated_at: new Date(),
    });
  },
};
