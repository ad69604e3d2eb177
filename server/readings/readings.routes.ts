import { Router } from 'express';
import { signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { AppError } from '../errors/app-error';
import { readingChangesSchema } from './readings.schemas';
import { ReadingsService } from './readings.service';

const EDITABLE = ['sampleTemperatureC', 'calibrationTemperatureC', 'note'];
const editable = readingChangesSchema.pick({ sampleTemperatureC: true, calibrationTemperatureC: true, note: true });

/** The value, unit, instrument and time as read are never changed: a wrong reading is deleted and logged again. */
function refuseRawChanges(body: unknown): void {
  const fixed = Object.keys((body ?? {}) as object).filter((key) => !EDITABLE.includes(key));
  if (fixed.length) {
    const fields = Object.fromEntries(fixed.map((key) => [key, 'cannot change: delete the reading and log it again']));
    throw new AppError('validation-failed', `Please check these fields: ${fixed.join(', ')}.`, 400, fields);
  }
}

/** /api/readings/:readingId: the batch's editors change temperatures and note, or delete (both audited). */
export function createReadingsRouter(readings: ReadingsService): Router {
  const router = Router();
  const readingId = (params: Record<string, unknown>) => parseId(params.readingId, 'readingId');

  router.patch('/:readingId', signedIn, async (req, res) => {
    refuseRawChanges(req.body);
    res.json(await readings.edit(req.user!, readingId(req.params), parseRequest(editable, req.body)));
  });

  router.delete('/:readingId', signedIn, async (req, res) => {
    await readings.remove(req.user!, readingId(req.params));
    res.status(204).end();
  });

  return router;
}
