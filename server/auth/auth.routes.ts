import { Request, Response, Router } from 'express';
import { SessionProbeResponse, SessionResponse, SessionUser } from '@shared/auth';
import { AppError } from '../errors/app-error';
import { parseRequest } from '../http/parse-request';
import { AuthService } from './auth.service';
import { AppPassport } from './passport-setup';
import { signInSchema } from './auth.schemas';
import { issueCsrfToken } from './csrf-protection';
import { publicRoute, signedIn } from './route-access';
import { SignInThrottle } from './sign-in-throttle';

function authenticateLocal(passport: AppPassport, req: Request, res: Response): Promise<SessionUser | false> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', { session: false }, (err: unknown, user: SessionUser | false) =>
      err ? reject(err) : resolve(user),
    )(req, res, reject);
  });
}

/** Signs the person in; passport regenerates the session id, so a planted id is useless. */
export function logIn(req: Request, res: Response, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) => {
    req.logIn(user, (err) => {
      if (err) return reject(err);
      issueCsrfToken(req, res, true);
      resolve();
    });
  });
}

/** /api/auth: the session probe, sign-in and sign-out. */
export function createAuthRouter(deps: { auth: AuthService; passport: AppPassport; throttle: SignInThrottle; coopTimeZone: string }): Router {
  const router = Router();

  router.get('/session', publicRoute, (req, res) => {
    const body: SessionProbeResponse = { user: req.user ?? null, coopTimeZone: deps.coopTimeZone };
    res.json(body);
  });

  router.post('/sign-in', publicRoute, async (req, res) => {
    const { email } = parseRequest(signInSchema, req.body);
    const ip = req.ip ?? 'unknown';
    await deps.throttle.admit(email, ip);
    req.body.email = email;
    const user = await authenticateLocal(deps.passport, req, res);
    if (!user) throw new AppError('invalid-credentials', 'That e-mail and password do not match an active account.', 401);
    await deps.throttle.recordSuccess(email, ip);
    await logIn(req, res, user);
    await deps.auth.recordSignIn(user, ip);
    const body: SessionResponse = { user };
    res.json(body);
  });

  router.post('/sign-out', signedIn, async (req, res) => {
    await new Promise<void>((resolve, reject) => req.logOut((err) => (err ? reject(err) : resolve())));
    issueCsrfToken(req, res, true);
    res.status(204).end();
  });

  return router;
}
