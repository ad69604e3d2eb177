import { Router } from 'express';
import { Knex } from 'knex';
import { FermentationChartData, forecastFromReadings } from '@shared/fermentation';
import { abvSoFar, attenuationSoFar } from '@shared/readings';
import { signedIn } from '../auth/route-access';
import { batchNotFound } from '../batches/batch-access';
import { effectiveOg } from '../batches/batch-mapping';
import { batchesRepository } from '../batches/batches.repository';
import { parseId } from '../http/parse-request';
import { fermentationRepository } from './fermentation.repository';

/** The fermentation chart of a batch with its forecast, worked out from the readings. */
export async function fermentationChart(db: Knex, batchId: number): Promise<FermentationChartData> {
  const batch = await batchesRepository.findById(db, batchId);
  if (!batch) throw batchNotFound();
  const readings = await fermentationRepository.readings(db, batchId);
  const og = effectiveOg(batch, readings.map((r) => ({ at: r.at, sg: r.sg, instrument: 'hydrometer' as const })));
  const latest = readings.length ? readings[readings.length - 1].sg : null;
  return {
    batchId, batchName: batch.name, og, readings,
    apparentAttenuationPercent: attenuationSoFar(og, latest),
    abvSoFar: abvSoFar(og, latest),
    forecast: forecastFromReadings(readings.map((r) => ({ time: r.at, gravity: r.sg })), og),
  };
}

/** /api/batches/:batchId/fermentation: every member reads a batch's chart data and forecast. */
export function createFermentationRouter(db: Knex): Router {
  const router = Router({ mergeParams: true });
  router.get('/', signedIn, async (req, res) => {
    res.json(await fermentationChart(db, parseId((req.params as Record<string, string>).batchId, 'batchId')));
  });
  return router;
}
