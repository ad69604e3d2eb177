import { Router } from 'express';
import { requireRole, signedIn } from '../auth/route-access';
import { BrewhouseService } from './brewhouse.service';

/** /api/brewhouse: read by everyone, set by brewers and admins. */
export function createBrewhouseRouter(brewhouse: BrewhouseService): Router {
  const router = Router();

  router.get('/', signedIn, async (_req, res) => {
    res.json(await brewhouse.load());
  });

  router.put('/', requireRole('brewer', 'admin'), async (req, res) => {
    res.json(await brewhouse.save(req.user!.id, req.body));
  });

  return router;
}
