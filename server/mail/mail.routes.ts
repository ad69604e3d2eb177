import { Router } from 'express';
import { requireRole } from '../auth/route-access';
import { parseId } from '../http/parse-request';
import { OutboxService } from './outbox.service';

const admin = requireRole('admin');

/** /api/admin/mail: the outbox for admins: what was sent, what waits, and why a message failed. */
export function createMailRouter(outbox: OutboxService): Router {
  const router = Router();

  router.get('/', admin, async (_req, res) => {
    res.json(await outbox.list());
  });

  router.get('/:messageId', admin, async (req, res) => {
    res.json(await outbox.message(parseId(req.params.messageId, 'messageId')));
  });

  router.post('/:messageId/retry', admin, async (req, res) => {
    res.json(await outbox.retry(parseId(req.params.messageId, 'messageId')));
  });

  return router;
}
