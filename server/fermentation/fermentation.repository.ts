import { Knex } from 'knex';
import { ChartReading } from '@shared/fermentation';

/** Data access for the fermentation chart: every reading of a batch, oldest first, as drawn. */
export const fermentationRepository = {
  async readings(db: Knex, batchId: number): Promise<ChartReading[]> {
    const rows = await db('gravity_readings').where({ batch_id: batchId }).orderBy('measured_at').select('measured_at', 'corrected_sg', 'sample_temperature_c');
    return rows.map((r) => ({ at: r.measured_at.getTime(), sg: Number(r.corrected_sg), temperatureC: r.sample_temperature_c === null ? null : Number(r.sample_temperature_c) }));
  },
};
