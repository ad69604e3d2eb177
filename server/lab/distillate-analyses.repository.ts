import { Knex } from 'knex';
import { DistillateAnalysisResult } from '@shared/strength-check';

type StoredResult = Pick<DistillateAnalysisResult, 'tableName' | 'distillatePercentVolume20' | 'beerPercentVolume20' | 'aboveBeerRange'>;

interface AnalysisRow {
  id: number; batch_id: number; sample_volume_ml: string; made_up_volume_ml: string; distillate_density: string; temperature_c: string; density_resolution: string;
  result: StoredResult | string; analysed_by: string; created_at: Date;
}

function toResult(r: AnalysisRow): DistillateAnalysisResult {
  const result = typeof r.result === 'string' ? (JSON.parse(r.result) as StoredResult) : r.result;
  return {
    id: r.id, batchId: r.batch_id, sampleVolumeMl: Number(r.sample_volume_ml), madeUpVolumeMl: Number(r.made_up_volume_ml), distillateDensity: Number(r.distillate_density),
    temperatureC: Number(r.temperature_c), densityResolution: Number(r.density_resolution), ...result, analysedBy: r.analysed_by, analysedAt: r.created_at.toISOString(),
  };
}

/** Data access for lab distillate analyses. */
export const distillateAnalysesRepository = {
  async insert(trx: Knex, row: { batchId: number; input: Omit<DistillateAnalysisResult, 'id' | 'batchId' | 'analysedBy' | 'analysedAt' | keyof StoredResult>; tableId: number | null; result: StoredResult; userId: number }): Promise<number> {
    const [id] = await trx('distillate_analyses').insert({
      batch_id: row.batchId, sample_volume_ml: row.input.sampleVolumeMl, made_up_volume_ml: row.input.madeUpVolumeMl, distillate_density: row.input.distillateDensity,
      temperature_c: row.input.temperatureC, density_resolution: row.input.densityResolution, density_table_id: row.tableId, result: JSON.stringify(row.result), analysed_by_user_id: row.userId,
    } as never);
    return id;
  },

  async forBatch(db: Knex, batchId: number, limit?: number): Promise<DistillateAnalysisResult[]> {
    const query = db('distillate_analyses as a').join('users', 'users.id', 'a.analysed_by_user_id').where('a.batch_id', batchId).orderBy('a.id', 'desc').select('a.*', 'users.name as analysed_by');
    if (limit) query.limit(limit);
    return ((await query) as AnalysisRow[]).map(toResult);
  },

  async find(db: Knex, id: number): Promise<DistillateAnalysisResult | null> {
    const row = await db('distillate_analyses as a').join('users', 'users.id', 'a.analysed_by_user_id').where('a.id', id).first('a.*', 'users.name as analysed_by');
    return row ? toResult(row as AnalysisRow) : null;
  },
};
