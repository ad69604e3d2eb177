import { Router } from 'express';
import { z } from 'zod';
import { DISTILLATE_LIMITS as D, TOLERANCE_CLASS_LIMITS as L } from '@shared/strength-check';
import { requireRole, signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { DistillateAnalysesService } from './distillate-analyses.service';
import { ToleranceClassesService } from './tolerance-classes.service';

const toleranceClassSchema = z.object({
  name: z.string('is required').trim().min(1, 'is required').max(L.nameMax, `must be at most ${L.nameMax} characters`),
  tolerancePercentVolume: z.number('must be a number').min(L.tolerance.min, `must be at least ${L.tolerance.min} % vol`).max(L.tolerance.max, `must be at most ${L.tolerance.max} % vol`),
  note: z.string('must be text').trim().max(L.noteMax, `must be at most ${L.noteMax} characters`).default(''),
  retired: z.boolean('must be true or false').optional(),
});

const range = (r: { min: number; max: number }, unit: string) => z.number('must be a number').min(r.min, `must be at least ${r.min} ${unit}`).max(r.max, `must be at most ${r.max} ${unit}`);
const analysisSchema = z.object({
  batchId: z.number('must be a batch id').int().positive('must be a batch id'),
  sampleVolumeMl: range(D.volumeMl, 'mL'),
  madeUpVolumeMl: range(D.volumeMl, 'mL'),
  distillateDensity: range(D.density, 'kg/m³'),
  temperatureC: range(D.temperature, '°C'),
  densityResolution: range(D.densityResolution, 'kg/m³'),
});
const batchQuery = z.object({ batchId: z.coerce.number('must be a batch id').int().positive('must be a batch id') });

/** /api/lab: product classes with their tolerances (read by all, kept by admins); distillate analyses (recorded by brewers). */
export function createLabRouter(toleranceClasses: ToleranceClassesService, analyses: DistillateAnalysesService): Router {
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

  router.get('/distillate-analyses', signedIn, async (req, res) => {
    res.json(await analyses.list(parseRequest(batchQuery, req.query).batchId));
  });

  router.post('/distillate-analyses', requireRole('brewer'), async (req, res) => {
    res.status(201).json(await analyses.record(req.user!, parseRequest(analysisSchema, req.body)));
  });

  return router;
}
