import { Router } from 'express';
import { Knex } from 'knex';
import { z } from 'zod';
import { UNIT_SYSTEMS, UserPreferences } from '@shared/recipes';
import { signedIn } from '../auth/route-access';
import { parseRequest } from '../http/parse-request';
import { usersRepository } from '../users/users.repository';

const preferencesSchema = z.object({ unitSystem: z.enum(UNIT_SYSTEMS, `must be one of ${UNIT_SYSTEMS.join(', ')}`) });

/** /api/preferences: the signed-in person's own display settings. */
export function createPreferencesRouter(db: Knex): Router {
  const router = Router();

  router.get('/', signedIn, async (req, res) => {
    const body: UserPreferences = { unitSystem: await usersRepository.unitSystem(db, req.user!.id) };
    res.json(body);
  });

  router.put('/', signedIn, async (req, res) => {
    const preferences = parseRequest(preferencesSchema, req.body);
    await usersRepository.update(db, req.user!.id, { unit_system: preferences.unitSystem });
    res.json(preferences);
  });

  return router;
}
