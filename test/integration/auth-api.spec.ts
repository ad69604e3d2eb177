import request from 'supertest';
import { createDb } from '@server/db';
import { ApiClient } from './helpers/api-client';
import { createTestApp, testConfig, TestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Sign-in API', () => {
  let t: TestApp;
  beforeAll(() => (t = createTestApp({ signInLimits: { perAccountAndAddress: 3, windowSeconds: 600, perAddress: 1000, addressWindowSeconds: 60 } })));
  afterAll(async () => {
    t.close();
    await t.db.destroy();
  });

  it('when a member signs in with the right password, then the session knows them and the session id changes', async () => {
    const user = await createUser(t.db, ['member', 'brewer']);
    const client = await ApiClient.anonymous(t.app);
    const before = (await client.get('/api/auth/session')).headers['set-cookie'];
    const res = await client.send('post', '/api/auth/sign-in', { email: user.email.toUpperCase(), password: user.password });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ id: user.id, email: user.email, roles: ['member', 'brewer'] });
    const sid = (cookies: string[] | undefined) => cookies?.find((c) => c.startsWith('commonwort.sid='))?.split(';')[0];
    expect(sid(res.headers['set-cookie'] as unknown as string[])).toBeDefined();
    expect(sid(res.headers['set-cookie'] as unknown as string[])).not.toEqual(sid(before as unknown as string[]));
    expect((await client.get('/api/auth/session')).body.user.id).toBe(user.id);
  });

  it('when the session cookie is set, then it is HttpOnly and SameSite=Lax', async () => {
    const user = await createUser(t.db);
    const client = await ApiClient.anonymous(t.app);
    const res = await client.send('post', '/api/auth/sign-in', { email: user.email, password: user.password });
    const cookie = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('commonwort.sid='))!;
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
  });

  it('when the password is wrong or the e-mail unknown, then both answer 401 with the same message', async () => {
    const user = await createUser(t.db);
    const client = await ApiClient.anonymous(t.app);
    const wrong = await client.send('post', '/api/auth/sign-in', { email: user.email, password: 'not the password' });
    const unknown = await client.send('post', '/api/auth/sign-in', { email: 'nobody@test.example', password: 'not the password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('when sign-in input is malformed, then it answers 400 naming each field', async () => {
    const client = await ApiClient.anonymous(t.app);
    const res = await client.send('post', '/api/auth/sign-in', { email: 'not-an-address', password: 42 });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation-failed');
    expect(Object.keys(res.body.fields).sort()).toEqual(['email', 'password']);
  });

  it('when the body is not JSON, then it answers 400, not 500', async () => {
    const client = await ApiClient.anonymous(t.app);
    const res = await client.agent.post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
  });

  it('when wrong passwords repeat past the limit, then it answers 429 with a retry time, even for the right password', async () => {
    const user = await createUser(t.db);
    const client = await ApiClient.anonymous(t.app);
    for (let i = 0; i < 3; i++) {
      expect((await client.send('post', '/api/auth/sign-in', { email: user.email, password: 'wrong one' })).status).toBe(401);
    }
    const blocked = await client.send('post', '/api/auth/sign-in', { email: user.email, password: user.password });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.retryAfterSeconds).toBeGreaterThan(0);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('when a deactivated member signs in with the right password, then it answers 401', async () => {
    const user = await createUser(t.db, ['member'], { active: false });
    const res = await (await ApiClient.anonymous(t.app)).send('post', '/api/auth/sign-in', { email: user.email, password: user.password });
    expect(res.status).toBe(401);
  });

  it('when a member signs out, then the session is anonymous again', async () => {
    const client = await ApiClient.signedIn(t.app, await createUser(t.db));
    expect((await client.send('post', '/api/auth/sign-out')).status).toBe(204);
    expect((await client.get('/api/auth/session')).body.user).toBeNull();
  });

  it('when anyone probes the session, then the co-op time zone comes with it', async () => {
    const res = await request(t.app).get('/api/auth/session');
    expect(res.body.coopTimeZone).toBe(t.config.coopTimeZone);
  });

  it('when the server process is replaced, then a signed-in session still works', async () => {
    const user = await createUser(t.db);
    const client = await ApiClient.signedIn(t.app, user);
    const restarted = createTestApp({ db: createDb(testConfig().db) });
    try {
      const res = await request(restarted.app).get('/api/auth/session').set('Cookie', client.cookieHeader());
      expect(res.body.user?.id).toBe(user.id);
    } finally {
      restarted.close();
      await restarted.db.destroy();
    }
  });

  it('when the health route is asked, then it reports the database as up', async () => {
    const res = await (await ApiClient.anonymous(t.app)).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', database: 'up' });
  });

  it('when one address asks for password resets past the limit, then it answers 429 with a retry time', async () => {
    const limited = createTestApp({ db: t.db, publicRequestLimit: { points: 2, windowSeconds: 600 } });
    const guest = await ApiClient.anonymous(limited.app);
    for (let i = 0; i < 2; i++) expect((await guest.send('post', '/api/password-resets/requests', { email: 'someone@test.example' })).status).toBe(202);
    const refused = await guest.send('post', '/api/password-resets/requests', { email: 'someone@test.example' });
    expect(refused.status).toBe(429);
    expect(refused.body.error.retryAfterSeconds).toBeGreaterThan(0);
    limited.close();
  });
});
