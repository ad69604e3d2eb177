import { Router } from 'express';
import { z } from 'zod';
import { TOLERANCE_CLASS_LIMITS as L } from '@shared/strength-check';
import { requireRole, signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { ToleranceClassesService } from './tolerance-classes.service';

const toleranceClassSchema = z.object({
  name: z.string('is required').trim().min(1, 'is required').max(L.nameMax, `must be at most ${L.nameMax} characters`),
  tolerancePercentVolume: z.number('must be a number').min(L.tolerance.min, `must be at least ${L.tolerance.min} % vol`).max(L.tolerance.max, `must be at most ${L.tolerance.max} % vol`),
  note: z.string('must be text').trim().max(L.noteMax, `must be at most ${L.noteMax} characters`).default(''),
  retired: z.boolean('must be true or false').optional(),
});

/** /api/lab: product classes with their tolerances (read by all, kept by admins). */
export function createLabRouter(toleranceClasses: ToleranceClassesService): Router {
  const router = Router();
  const admins = requireRole('admin');

  router.get('/tolerance-classes', signedIn, async (req, res) => {
    res.json(await toleranceClasses.list(req.query.includeRetired === 'true'));
  });

  router.post('/tolerance-classes', admins, async (req, res) => {
    res.status(201).json(await toleranceClasses.create(req.user!, parseRequest(toleranceClassSchema, req.body)));
  });

  router.put('/tolerance-classes/:toleranceClassId', admins, async (req, res) => {
    const id = parseId(req.params.toleranceClassId, 'toleranceClassId');
    res.json(await toleranceClasses.update(req.user!, id, parseRequest(toleranceClassSchema, req.body)));
  });

  return router;
}
