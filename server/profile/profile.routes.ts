import { Router } from 'express';
import { signedIn } from '../auth/route-access';
import { parseRequest } from '../http/parse-request';
import { changePasswordSchema, updateProfileSchema } from './profile.schemas';
import { ProfileService } from './profile.service';

/** /api/profile: the signed-in person's own account. */
export function createProfileRouter(profile: ProfileService): Router {
  const router = Router();

  router.get('/', signedIn, async (req, res) => {
    res.json(await profile.load(req.user!.id));
  });

  router.put('/', signedIn, async (req, res) => {
    const changes = parseRequest(updateProfileSchema, req.body);
    res.json(await profile.update(req.user!.id, changes));
  });

  router.put('/password', signedIn, async (req, res) => {
    const request = parseRequest(changePasswordSchema, req.body);
    await profile.changePassword(req.user!.id, req.sessionID, request);
    res.status(204).end();
  });

  return router;
}
