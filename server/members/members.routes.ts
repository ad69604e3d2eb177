import { Router } from 'express';
import { z } from 'zod';
import { requireRole } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { rolesField } from '../invitations/invitations.schemas';
import { PasswordResetsService } from '../password-resets/password-resets.service';
import { MembersService } from './members.service';

const updateMemberSchema = z
  .object({ roles: rolesField.optional(), active: z.boolean('must be true or false').optional() })
  .strict()
  .refine((body) => body.roles !== undefined || body.active !== undefined, { message: 'give roles or active', path: ['roles'] });

/** /api/members: admins only. */
export function createMembersRouter(members: MembersService, resets: PasswordResetsService): Router {
  const router = Router();

  router.get('/', requireRole('admin'), async (_req, res) => {
    res.json(await members.list());
  });

  router.patch('/:memberId', requireRole('admin'), async (req, res) => {
    const memberId = parseId(req.params.memberId, 'memberId');
    const changes = parseRequest(updateMemberSchema, req.body);
    res.json(await members.update(req.user!.id, memberId, changes));
  });

  router.post('/:memberId/password-reset', requireRole('admin'), async (req, res) => {
    const memberId = parseId(req.params.memberId, 'memberId');
    res.status(201).json(await resets.issue(req.user!.id, memberId));
  });

  return router;
}
