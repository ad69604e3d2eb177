import { randomUUID } from 'node:crypto';
import { Knex } from 'knex';
import { sgFromPlato } from '@shared/science';

const HOUR = 3_600_000;

/**
 * A batch with OG 1.048 on the brew day and a hydrometer reading every 6 hours for six days along a
 * logistic fall from 12 to 2.4 °P (figures invented for the test), and a product class of ± 0.5 % vol.
 */
export async function seedFermentedBatch(db: Knex, brewerId: number, readings = 24) {
  const tag = randomUUID().slice(0, 8);
  const [batchId] = await db('batches').insert({ name: `Seeded ale ${tag}`, brewer_user_id: brewerId, created_by_user_id: brewerId, brew_date: '2026-11-20', planned_volume_litres: 20, status: 'fermenting', fermenting_at: new Date('2026-11-20T10:00:00Z') } as never);
  await db('brew_day_measurements').insert({ batch_id: batchId, original_gravity: 1.048, original_gravity_temperature_c: 20, updated_by_user_id: brewerId } as never);
  const start = Date.parse('2026-11-20T12:00:00Z');
  const rows = Array.from({ length: readings }, (_, i) => {
    const sg = Math.round(sgFromPlato(2.4 + 9.6 / (1 + Math.exp(1.6 * (i / 4 - 2.5)))) * 1000) / 1000;
    return { batch_id: batchId, measured_at: new Date(start + i * 6 * HOUR), instrument: 'hydrometer', raw_value: sg, raw_unit: 'sg', sample_temperature_c: 19, calibration_temperature_c: 20, corrected_sg: sg, source: 'hand', created_by_user_id: brewerId };
  });
  await db('gravity_readings').insert(rows as never);
  const [toleranceClassId] = await db('tolerance_classes').insert({ name: `Ale ${tag}`, tolerance_percent_volume: 0.5, note: '' });
  return { batchId: Number(batchId), toleranceClassId, toleranceClassName: `Ale ${tag}`, lastReadingAt: start + (readings - 1) * 6 * HOUR };
}

/** One more reading after the others, as a logger or a person would add it. */
export async function addReading(db: Knex, batchId: number, at: number, sg: number): Promise<void> {
  await db('gravity_readings').insert({ batch_id: batchId, measured_at: new Date(at), instrument: 'hydrometer', raw_value: sg, raw_unit: 'sg', sample_temperature_c: 19, calibration_temperature_c: 20, corrected_sg: sg, source: 'hand' } as never);
}
