import { Router } from 'express';
import { Knex } from 'knex';
import { publicRoute } from '../auth/route-access';
import { databaseReachable } from './health.repository';

/** /api/health: is the server up, and can it reach its database? */
export function createHealthRouter(db: Knex): Router {
  const router = Router();
  router.get('/', publicRoute, async (_req, res) => {
    const up = await databaseReachable(db);
    res.status(up ? 200 : 503).json({ status: up ? 'ok' : 'degraded', database: up ? 'up' : 'down' });
  });
  return router;
}
