import { ROLES } from '@shared/auth';
import { ApiClient } from './helpers/api-client';
import { listApiRoutes, samplePath } from './helpers/route-table';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

// The only routes an anonymous caller may reach. Adding a public route means adding it here, on purpose.
const PUBLIC_ROUTES = [
  'GET /api/health',
  'GET /api/auth/session',
  'POST /api/auth/sign-in',
  'GET /api/invitations/:token',
  'POST /api/invitations/:token/acceptance',
  'POST /api/password-resets/requests',
  'POST /api/password-resets',
  'POST /api/readings/push',
  'GET /api/bookings/feed/:token',
].sort();

// Public routes a device calls with a bearer token instead of a session: no CSRF, 401 without the token.
const TOKEN_ROUTES = ['POST /api/readings/push'];

const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

describe('API route table', () => {
  const t = useTestApp();

  const routes = () => listApiRoutes(t.app);

  it('when the app is built, then every route declares who may call it as its first handler', () => {
    const undeclared = routes().filter((route) => route.access === undefined);
    expect(routes().length).toBeGreaterThan(8);
    expect(undeclared).toEqual([]);
  });

  it('when listing public routes, then they are exactly the agreed list', () => {
    const publicRoutes = routes().filter((route) => route.access === 'public').map((route) => `${route.method} ${route.path}`);
    expect(publicRoutes.sort()).toEqual(PUBLIC_ROUTES);
  });

  it('when an anonymous caller with a valid CSRF token calls any non-public route, then it answers 401', async () => {
    const anonymous = await ApiClient.anonymous(t.app);
    for (const route of routes().filter((r) => r.access !== 'public')) {
      const res = await anonymous.send(route.method.toLowerCase() as 'get', samplePath(route.path), {});
      expect({ route: `${route.method} ${route.path}`, status: res.status }).toEqual({ route: `${route.method} ${route.path}`, status: 401 });
      expect(res.body.error.code).toBe('not-signed-in');
    }
  });

  it('when a person whose roles are not allowed calls a route, then it answers 403', async () => {
    let checked = 0;
    for (const role of ROLES) {
      const client = await ApiClient.signedIn(t.app, await createUser(t.db, [role]));
      for (const route of routes().filter((r) => r.access !== 'public' && !r.access!.includes(role))) {
        const res = await client.send(route.method.toLowerCase() as 'get', samplePath(route.path), {});
        expect({ route: `${role} ${route.method} ${route.path}`, status: res.status }).toEqual({ route: `${role} ${route.method} ${route.path}`, status: 403 });
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(0);
  });

  it('when any state-changing route is called without the CSRF header, then it answers 403 even for an admin', async () => {
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, [...ROLES]));
    const unsafe = routes().filter((route) => STATE_CHANGING.has(route.method) && !TOKEN_ROUTES.includes(`${route.method} ${route.path}`));
    expect(unsafe.length).toBeGreaterThan(5);
    for (const route of unsafe) {
      const res = await admin.send(route.method.toLowerCase() as 'post', samplePath(route.path), {}, false);
      expect({ route: `${route.method} ${route.path}`, status: res.status }).toEqual({ route: `${route.method} ${route.path}`, status: 403 });
    }
  });

  it('when a token route is called without its token, then it answers 401 even for a signed-in admin', async () => {
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, [...ROLES]));
    for (const route of TOKEN_ROUTES) {
      const [method, path] = route.split(' ');
      const res = await admin.send(method.toLowerCase() as 'post', path, {});
      expect({ route, status: res.status }).toEqual({ route, status: 401 });
    }
  });

  it('when an unknown API path is called, then it answers 404 as JSON', async () => {
    const res = await (await ApiClient.anonymous(t.app)).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('no-such-route');
  });
});
