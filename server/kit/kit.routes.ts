import { Router } from 'express';
import { requireRole, signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { kitItemChangesSchema, kitItemSchema, maintenanceEntrySchema } from './kit.schemas';
import { KitService } from './kit.service';

/** /api/kit: the register is read by everyone signed in and kept by admins. */
export function createKitRouter(kit: KitService): Router {
  const router = Router();
  const kitItemId = (params: Record<string, unknown>) => parseId(params.kitItemId, 'kitItemId');

  router.get('/', signedIn, async (_req, res) => {
    res.json(await kit.list());
  });

  router.post('/', requireRole('admin'), async (req, res) => {
    res.status(201).json(await kit.create(req.user!, parseRequest(kitItemSchema, req.body)));
  });

  router.get('/:kitItemId', signedIn, async (req, res) => {
    res.json(await kit.get(kitItemId(req.params)));
  });

  router.patch('/:kitItemId', requireRole('admin'), async (req, res) => {
    const changes = parseRequest(kitItemChangesSchema, req.body);
    res.json(await kit.update(req.user!, kitItemId(req.params), changes));
  });

  router.get('/:kitItemId/maintenance', signedIn, async (req, res) => {
    res.json(await kit.maintenanceLog(kitItemId(req.params)));
  });

  router.post('/:kitItemId/maintenance', requireRole('admin'), async (req, res) => {
    const entry = parseRequest(maintenanceEntrySchema, req.body);
    res.status(201).json(await kit.recordMaintenance(req.user!, kitItemId(req.params), entry));
  });

  return router;
}
