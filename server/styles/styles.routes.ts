import { Router } from 'express';
import { z } from 'zod';
import { NAME_MAX_LENGTH, NumberLimit, STYLE_TARGET_LIMITS } from '@shared/recipes';
import { requireRole, signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { StylesService } from './styles.service';

const bound = ({ min, max }: NumberLimit) => z.number('must be a number').min(min, `must be at least ${min}`).max(max, `must be at most ${max}`);
const range = (limit: NumberLimit) =>
  z.object({ min: bound(limit), max: bound(limit) }).refine((r) => r.min <= r.max, { message: 'min must not exceed max', path: ['max'] });

const styleSchema = z.object({
  name: z.string('must be text').trim().min(1, 'must not be empty').max(NAME_MAX_LENGTH, `must be at most ${NAME_MAX_LENGTH} characters`),
  og: range(STYLE_TARGET_LIMITS.og),
  fg: range(STYLE_TARGET_LIMITS.fg),
  abv: range(STYLE_TARGET_LIMITS.abv),
  ibu: range(STYLE_TARGET_LIMITS.ibu),
  colourSrm: range(STYLE_TARGET_LIMITS.colourSrm),
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
