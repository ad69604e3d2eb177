import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { analyseDistillate, distillateStrengthUncertainty, ScienceRangeError } from '@shared/science';
import {
  analyseDistillateWithTable, BUILTIN_TABLE_NAME, DistillateAnalysisRequest, DistillateAnalysisResult, distillateWithTableUncertainty, LabComparison, LabTable,
} from '@shared/strength-check';
import { recordAudit } from '../audit/audit-log.repository';
import { batchNotFound } from '../batches/batch-access';
import { batchesRepository } from '../batches/batches.repository';
import { AppError } from '../errors/app-error';
import { ReferenceTablesService } from '../reference-tables';
import { distillateAnalysesRepository as repo } from './distillate-analyses.repository';

/** The latest lab figure of a batch, for the strength check to compare. */
export type LatestLabResult = (batchId: number) => Promise<LabComparison | null>;

/** Lab distillate analyses: brewers record them; the result reads the table the lab has chosen. */
export function createDistillateAnalysesService(db: Knex, tables: ReferenceTablesService) {
  function work(table: { name: string; lab: LabTable } | null, r: DistillateAnalysisRequest) {
    const [v, made] = [r.sampleVolumeMl / 1000, r.madeUpVolumeMl / 1000];
    if (!table) {
      const analysis = analyseDistillate(v, made, r.distillateDensity, r.temperatureC);
      const beer = distillateStrengthUncertainty(v, made, r.distillateDensity, r.temperatureC, { densityResolution: r.densityResolution });
      return { tableName: BUILTIN_TABLE_NAME, distillatePercentVolume20: analysis.distillatePercentVolume20, beerPercentVolume20: beer, aboveBeerRange: analysis.aboveBeerRange };
    }
    const analysis = analyseDistillateWithTable(table.lab, v, made, r.distillateDensity, r.temperatureC);
    const beer = distillateWithTableUncertainty(table.lab, v, made, r.distillateDensity, r.temperatureC, r.densityResolution);
    return { tableName: table.name, distillatePercentVolume20: analysis.distillatePercentVolume20, beerPercentVolume20: beer, aboveBeerRange: analysis.aboveBeerRange };
  }

  return {
    list: (batchId: number) => repo.forBatch(db, batchId),

    latest: (async (batchId) => {
      const [last] = await repo.forBatch(db, batchId, 1);
      return last ? { analysisId: last.id, analysedAt: last.analysedAt, percentVolume20: last.beerPercentVolume20, tableName: last.tableName } : null;
    }) as LatestLabResult,

    async record(user: SessionUser, request: DistillateAnalysisRequest): Promise<DistillateAnalysisResult> {
      if (!(await batchesRepository.findById(db, request.batchId))) throw batchNotFound();
      const table = await tables.labTable();
      let result;
      try {
        result = work(table, request);
      } catch (error) {
        if (error instanceof ScienceRangeError) throw new AppError('validation-failed', `Please check these fields: ${error.parameter}.`, 400, { [error.parameter === 'temperature' ? 'temperatureC' : error.parameter]: error.message });
        throw error;
      }
      const { batchId, ...input } = request;
      const id = await db.transaction(async (trx) => {
        const newId = await repo.insert(trx, { batchId, input, tableId: table?.id ?? null, result, userId: user.id });
        await recordAudit(trx, { actorUserId: user.id, action: 'distillate-analysed', subjectType: 'batch', subjectId: batchId, detail: { analysisId: newId } });
        return newId;
      });
      return (await repo.find(db, id))!;
    },
  };
}

export type DistillateAnalysesService = ReturnType<typeof createDistillateAnalysesService>;
