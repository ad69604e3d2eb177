import { RequestHandler, Router } from 'express';
import { SessionResponse } from '@shared/auth';
import { logIn } from '../auth/auth.routes';
import { publicRoute, requireRole } from '../auth/route-access';
import { AppError } from '../errors/app-error';
import { parseId, parseRequest } from '../http/parse-request';
import { acceptInvitationSchema, createInvitationSchema, invitationTokenSchema } from './invitations.schemas';
import { InvitationsService } from './invitations.service';

function parseToken(value: unknown): string {
  const result = invitationTokenSchema.safeParse(value);
  if (!result.success) throw new AppError('invitation-not-found', 'This invitation link is not valid.', 404);
  return result.data;
}

/** /api/invitations: officers invite; the invited person previews and accepts (public, by token, capped per address). */
export function createInvitationsRouter(invitations: InvitationsService, perAddress: RequestHandler): Router {
  const router = Router();

  router.post('/', requireRole('admin'), async (req, res) => {
    const { email, roles } = parseRequest(createInvitationSchema, req.body);
    res.status(201).json(await invitations.create(req.user!.id, email, roles));
  });

  router.delete('/:invitationId', requireRole('admin'), async (req, res) => {
    await invitations.revoke(req.user!.id, parseId(req.params.invitationId, 'invitationId'));
    res.status(204).end();
  });

  router.get('/:token', publicRoute, async (req, res) => {
    res.json(await invitations.preview(parseToken(req.params.token)));
  });

  router.post('/:token/acceptance', publicRoute, perAddress, async (req, res) => {
    const request = parseRequest(acceptInvitationSchema, req.body);
    const user = await invitations.accept(parseToken(req.params.token), request);
    await logIn(req, res, user);
    const body: SessionResponse = { user };
    res.status(201).json(body);
  });

  return router;
}
