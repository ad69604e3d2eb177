import { Router } from 'express';
import { signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { BatchesService } from './batches.service';
import { moveBatchStatus } from './batch-status-move';
import { saveBrewDay } from './brew-day';
import { brewDaySchema, correctionFactorSchema, createBatchSchema, moveBatchSchema, updateBatchSchema } from './batches.schemas';
import { setCorrectionFactor } from '../readings/correction-factor';
import { Knex } from 'knex';

/** /api/batches: every member reads co-op batches; the batch's brewer, brewers and admins change one (the service checks). */
export function createBatchesRouter(batches: BatchesService, db: Knex): Router {
  const router = Router();
  const batchId = (params: Record<string, unknown>) => parseId(params.batchId, 'batchId');

  router.get('/', signedIn, async (req, res) => {
    res.json(await batches.list(req.user!, req.query.mine === 'true'));
  });

  router.post('/', signedIn, async (req, res) => {
    res.status(201).json(await batches.create(req.user!, parseRequest(createBatchSchema, req.body)));
  });

  router.get('/brewers', signedIn, async (_req, res) => {
    res.json(await batches.brewers());
  });

  router.get('/fermenters', signedIn, async (_req, res) => {
    res.json(await batches.fermenters());
  });

  router.get('/:batchId', signedIn, async (req, res) => {
    res.json(await batches.get(req.user!, batchId(req.params)));
  });

  router.patch('/:batchId', signedIn, async (req, res) => {
    res.json(await batches.update(req.user!, batchId(req.params), parseRequest(updateBatchSchema, req.body)));
  });

  router.post('/:batchId/status', signedIn, async (req, res) => {
    const id = batchId(req.params);
    await moveBatchStatus(db, req.user!, id, parseRequest(moveBatchSchema, req.body));
    res.json(await batches.get(req.user!, id));
  });

  router.put('/:batchId/brew-day', signedIn, async (req, res) => {
    const id = batchId(req.params);
    await saveBrewDay(db, req.user!, id, parseRequest(brewDaySchema, req.body));
    res.json(await batches.get(req.user!, id));
  });

  router.post('/:batchId/correction-factor', signedIn, async (req, res) => {
    const id = batchId(req.params);
    await setCorrectionFactor(db, req.user!, id, parseRequest(correctionFactorSchema, req.body));
    res.json(await batches.get(req.user!, id));
  });

  return router;
}
