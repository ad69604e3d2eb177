import { Router } from 'express';
import { stringify } from 'csv-stringify/sync';
import { DEFAULT_READING_COLUMNS } from '@shared/readings';
import { signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { csvUpload } from './csv-upload';
import { importReadings } from './reading-import';
import { columnMappingSchema, importOptionsSchema, pushTokenSchema, readingInputSchema, readingPageSchema } from './readings.schemas';
import { ReadingsService } from './readings.service';
import { PushTokensService } from './push-tokens.service';
import { Knex } from 'knex';
import { AppError } from '../errors/app-error';

function parseColumns(json: string | undefined) {
  if (!json) return DEFAULT_READING_COLUMNS;
  try {
    return parseRequest(columnMappingSchema, JSON.parse(json));
  } catch (error) {
    if (error instanceof AppError) throw error;
    throw new AppError('validation-failed', 'Please check these fields: columns.', 400, { columns: 'must be the column mapping as JSON' });
  }
}

/** The gravity log under /api/batches/:batchId: readings, file import and export, logger push tokens. */
export function createBatchReadingsRouter(readings: ReadingsService, tokens: PushTokensService, db: Knex, coopTimeZone: string): Router {
  const router = Router();
  const batchId = (params: Record<string, unknown>) => parseId(params.batchId, 'batchId');

  router.get('/:batchId/readings', signedIn, async (req, res) => {
    res.json(await readings.page(batchId(req.params), parseRequest(readingPageSchema, req.query)));
  });

  router.post('/:batchId/readings', signedIn, async (req, res) => {
    res.status(201).json(await readings.add(req.user!, batchId(req.params), parseRequest(readingInputSchema, req.body)));
  });

  router.post('/:batchId/readings/import', signedIn, csvUpload, async (req, res) => {
    const options = parseRequest(importOptionsSchema, req.body);
    const upload = { fileName: req.file!.originalname, text: req.file!.buffer.toString('utf8'), mode: options.mode, dryRun: options.dryRun, columns: parseColumns(options.columns) };
    res.json(await importReadings(db, req.user!, batchId(req.params), upload, coopTimeZone));
  });

  router.get('/:batchId/readings/export', signedIn, async (req, res) => {
    const id = batchId(req.params);
    const rows = (await readings.allForBatch(id)).map((r) => [r.measuredAt, r.instrument, r.rawValue, r.rawUnit, r.sampleTemperatureC ?? '', r.calibrationTemperatureC ?? '', r.correctionFactor ?? '', r.correctedSg.toFixed(5), r.source, r.note]);
    const header = ['time', 'instrument', 'value', 'unit', 'temperature_c', 'calibration_c', 'correction_factor', 'corrected_sg_20_20', 'source', 'note'];
    res.type('text/csv').attachment(`batch-${id}-readings.csv`).send(stringify([header, ...rows]));
  });

  router.get('/:batchId/push-tokens', signedIn, async (req, res) => {
    res.json(await tokens.list(req.user!, batchId(req.params)));
  });

  router.post('/:batchId/push-tokens', signedIn, async (req, res) => {
    res.status(201).json(await tokens.create(req.user!, batchId(req.params), parseRequest(pushTokenSchema, req.body).label));
  });

  router.delete('/:batchId/push-tokens/:tokenId', signedIn, async (req, res) => {
    await tokens.revoke(req.user!, batchId(req.params), parseId(req.params.tokenId, 'tokenId'));
    res.status(204).end();
  });

  return router;
}
