import { Router } from 'express';
import { z } from 'zod';
import { requireRole, signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { StylesService } from './styles.service';

const range = (min: number, max: number) =>
  z
    .object({ min: z.number('must be a number').min(min).max(max), max: z.number('must be a number').min(min).max(max) })
    .refine((r) => r.min <= r.max, { message: 'min must not exceed max', path: ['max'] });

const styleSchema = z.object({
  name: z.string('must be text').trim().min(1, 'must not be empty').max(100),
  og: range(1, 1.2),
  fg: range(0.98, 1.1),
  abv: range(0, 20),
  ibu: range(0, 150),
  colourSrm: range(0, 80),
});

/** /api/styles: read by everyone, kept by brewers and admins. */
export function createStylesRouter(styles: StylesService): Router {
  const router = Router();

  router.get('/', signedIn, async (_req, res) => {
    res.json(await styles.list());
  });

  router.post('/', requireRole('brewer', 'admin'), async (req, res) => {
    res.status(201).json(await styles.create(req.user!.id, parseRequest(styleSchema, req.body)));
  });

  router.put('/:styleId', requireRole('brewer', 'admin'), async (req, res) => {
    const id = parseId(req.params.styleId, 'styleId');
    res.json(await styles.update(req.user!.id, id, parseRequest(styleSchema, req.body)));
  });

  return router;
}
