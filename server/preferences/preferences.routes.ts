import { Router } from 'express';
import { signedIn } from '../auth/route-access';
import { PreferencesService } from './preferences.service';

/** /api/preferences: the signed-in person's own display settings. */
export function createPreferencesRouter(preferences: PreferencesService): Router {
  const router = Router();

  router.get('/', signedIn, async (req, res) => {
    res.json(await preferences.load(req.user!.id));
  });

  router.put('/', signedIn, async (req, res) => {
    res.json(await preferences.save(req.user!.id, req.body));
  });

  return router;
}
