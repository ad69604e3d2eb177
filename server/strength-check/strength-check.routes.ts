import { Router } from 'express';
import { z } from 'zod';
import { DECLARED_STRENGTH_LIMITS as L } from '@shared/strength-check';
import { requireRole, signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { StrengthCheckService } from './strength-check.service';

const declared = z.number('must be a number').min(L.min, `must be at least ${L.min} % vol`).max(L.max, `must be at most ${L.max} % vol`);
const checkQuery = z.object({ declared: z.coerce.number('must be a number').pipe(declared).optional(), toleranceClassId: z.coerce.number().int().positive('must be a product class id').optional() });
const signOffSchema = z.object({ declaredPercentVolume: declared, toleranceClassId: z.number('must be a product class id').int().positive('must be a product class id') });

/** /api/batches/:batchId/strength: everyone reads the check and the records; brewers sign off. */
export function createStrengthCheckRouter(strength: StrengthCheckService): Router {
  const router = Router({ mergeParams: true });
  const batchId = (params: Record<string, unknown>) => parseId(params.batchId, 'batchId');

  router.get('/', signedIn, async (req, res) => {
    const query = parseRequest(checkQuery, req.query);
    res.json(await strength.check(batchId(req.params), { declaredPercentVolume: query.declared, toleranceClassId: query.toleranceClassId }));
  });

  router.post('/sign-offs', requireRole('brewer'), async (req, res) => {
    res.status(201).json(await strength.signOff(req.user!, batchId(req.params), parseRequest(signOffSchema, req.body)));
  });

  router.get('/sign-offs/:signOffId', signedIn, async (req, res) => {
    res.json(await strength.record(batchId(req.params), parseId(req.params.signOffId, 'signOffId')));
  });

  return router;
}
