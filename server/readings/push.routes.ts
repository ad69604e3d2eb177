import { Router } from 'express';
import { Knex } from 'knex';
import { publicRoute } from '../auth/route-access';
import { parseRequest } from '../http/parse-request';
import { createPushRateCheck, PushRateLimit } from './push-rate-limit';
import { hashPushToken, PushTokensService } from './push-tokens.service';
import { pushReadingsSchema } from './readings.schemas';

/**
 * POST /api/readings/push: a logger sends readings with `Authorization: Bearer <token>`. No session
 * and no CSRF token (a device has neither); the token is the credential, capped per token and address.
 */
export function createPushRouter(tokens: PushTokensService, db: Knex, limit: PushRateLimit): Router {
  const router = Router();
  const checkPushRate = createPushRateCheck(db, limit);
  router.post('/', publicRoute, async (req, res) => {
    const token = (req.get('authorization') ?? '').replace(/^Bearer\s+/i, '').trim();
    await checkPushRate({ token: hashPushToken(token).slice(0, 32), address: req.ip ?? 'unknown' });
    const row = await tokens.authenticate(token);
    res.json(await tokens.push(row, parseRequest(pushReadingsSchema, req.body)));
  });
  return router;
}
