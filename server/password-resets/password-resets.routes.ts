import { RequestHandler, Router } from 'express';
import { z } from 'zod';
import { emailField, newPasswordField } from '../auth/auth.schemas';
import { publicRoute } from '../auth/route-access';
import { parseRequest } from '../http/parse-request';
import { PasswordResetsService } from './password-resets.service';

const requestSchema = z.object({ email: emailField });
const completeSchema = z.object({
  token: z.string('must be text').regex(/^[A-Za-z0-9_-]{20,100}$/, 'is not a reset token'),
  password: newPasswordField,
});

/** /api/password-resets: public, by design; the answers never reveal whether an e-mail is known. */
export function createPasswordResetsRouter(resets: PasswordResetsService, perAddress: RequestHandler): Router {
  const router = Router();

  router.post('/requests', publicRoute, perAddress, async (req, res) => {
    const { email } = parseRequest(requestSchema, req.body);
    await resets.request(email);
    res.status(202).end();
  });

  router.post('/', publicRoute, perAddress, async (req, res) => {
    const { token, password } = parseRequest(completeSchema, req.body);
    await resets.complete(token, password);
    res.status(204).end();
  });

  return router;
}
