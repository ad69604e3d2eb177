import { Router } from 'express';
import { Knex } from 'knex';
import { publicRoute } from '../auth/route-access';

/** /api/health: is the server up, and can it reach its database? */
export function createHealthRouter(db: Knex): Router {
  const router = Router();
  router.get('/', publicRoute, async (_req, res) => {
    const database = await db
      .raw('SELECT 1')
      .then(() => 'up' as const)
      .catch(() => 'down' as const);
    res.status(database === 'up' ? 200 : 503).json({ status: database === 'up' ? 'ok' : 'degraded', database });
  });
  return router;
}
