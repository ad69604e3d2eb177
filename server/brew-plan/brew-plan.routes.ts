import { Router } from 'express';
import { requireRole, signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { acceptSlotSchema, movePlannedBatchSchema, proposalSchema, timelineQuerySchema } from './brew-plan.schemas';
import { BrewPlanReads } from './brew-plan.service';
import { BrewPlanWrites } from './plan-writes';

/** /api/brew-plan: every member reads the timeline; admins and brewers plan; admins may plan for another brewer. */
export function createBrewPlanRouter(reads: BrewPlanReads, writes: BrewPlanWrites): Router {
  const router = Router();

  router.get('/timeline', signedIn, async (req, res) => {
    const { from, weeks } = parseRequest(timelineQuerySchema, req.query);
    res.json(await reads.timeline(from, weeks));
  });

  router.get('/brewers', requireRole('admin'), async (_req, res) => {
    res.json(await reads.brewers());
  });

  router.post('/proposals', requireRole('admin', 'brewer'), async (req, res) => {
    res.json(await reads.proposals(req.user!, parseRequest(proposalSchema, req.body)));
  });

  router.post('/batches', requireRole('admin', 'brewer'), async (req, res) => {
    res.status(201).json(await writes.accept(req.user!, parseRequest(acceptSlotSchema, req.body)));
  });

  router.patch('/batches/:batchId', requireRole('admin', 'brewer'), async (req, res) => {
    res.json(await writes.move(req.user!, parseId(req.params.batchId, 'batchId'), parseRequest(movePlannedBatchSchema, req.body)));
  });

  return router;
}
