import './session-types';

export { createAuthRouter, logIn } from './auth.routes';
export { createAuthService, toSessionUser, type AuthService } from './auth.service';
export { csrfProtection, CSRF_COOKIE, CSRF_HEADER } from './csrf-protection';
export { createPassport } from './passport-setup';
export { createPasswordHasher, type PasswordHasher } from './password-hasher';
export { createOneTimeToken, hashOneTimeToken } from './one-time-token';
export { publicRoute, requireRole, signedIn, type AccessGuard, type RouteAccess } from './route-access';
export { createSessionMiddleware } from './session-middleware';
export { createSignInThrottle, DEFAULT_SIGN_IN_LIMITS, type SignInThrottle, type SignInThrottleLimits } from './sign-in-throttle';
