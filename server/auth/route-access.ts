import { RequestHandler } from 'express';
import { hasAnyRole, Role, ROLES } from '@shared/auth';
import { forbidden, notSignedIn } from '../errors/app-error';

/** Who may call a route: anyone, or a person holding one of the roles. */
export type RouteAccess = 'public' | readonly Role[];

/** A middleware that also states the access rule it enforces, so the route table can be audited. */
export type AccessGuard = RequestHandler & { readonly access: RouteAccess };

function guard(access: RouteAccess, handler: RequestHandler): AccessGuard {
  return Object.assign(handler, { access });
}

/** Open to anonymous callers (sign-in, health, invitation acceptance, password reset). */
export const publicRoute: AccessGuard = guard('public', (_req, _res, next) => next());

/** Lets the request through only for a signed-in, active person holding one of `roles`. */
export function requireRole(...roles: Role[]): AccessGuard {
  return guard(roles, (req, _res, next) => {
    if (!req.user) return next(notSignedIn());
    if (!hasAnyRole(req.user.roles, roles)) return next(forbidden());
    next();
  });
}

/** Any signed-in person, whatever their roles. */
export const signedIn: AccessGuard = requireRole(...ROLES);
