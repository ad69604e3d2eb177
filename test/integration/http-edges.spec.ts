import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { createApp } from '@server/app';
import { purgeExpiredRows } from '@server/housekeeping/housekeeping';
import { ApiClient } from './helpers/api-client';
import { createTestApp, TestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('HTTP edges: proxies, headers, static files, sessions', () => {
  let t: TestApp;
  beforeAll(() => (t = createTestApp({ publicRequestLimit: { points: 3, windowSeconds: 600 } })));
  afterAll(async () => {
    t.close();
    await t.db.destroy();
  });

  // Other spec files sign people in on the same database meanwhile; only a row without a signed-in
  // person could come from an anonymous visitor.
  const sessionCount = async () =>
    Number((await t.db('sessions').whereNot('sess', 'like', '%"passport"%').count({ n: '*' }))[0].n);

  it('when a client forges earlier X-Forwarded-For entries, then only the hop the trusted proxy added counts as its address', async () => {
    const realAddress = '10.200.1.1';
    const forged = (i: number) => request(t.app).post('/api/password-resets/requests').set('X-Forwarded-For', `203.0.113.${i}, ${realAddress}`);
    const guest = new ApiClient(t.app, realAddress);
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      const res = await forged(i).set('X-XSRF-TOKEN', 'x'.repeat(32)).set('Cookie', `XSRF-TOKEN=${'x'.repeat(32)}`).send({ email: 'a@test.example' });
      statuses.push(res.status);
    }
    expect(guest.address).toBe(realAddress);
    expect(statuses).toEqual([202, 202, 202, 429, 429]);
  });

  it('when the request came over plain http, then no HSTS header is sent; over https through the trusted proxy it is', async () => {
    const plain = await request(t.app).get('/api/health');
    const secure = await request(t.app).get('/api/health').set('X-Forwarded-Proto', 'https');
    expect(plain.headers['strict-transport-security']).toBeUndefined();
    expect(secure.headers['strict-transport-security']).toMatch(/max-age=\d+/);
  });

  it('when a file with an extension does not exist, then it answers 404, not the app page', async () => {
    const res = await request(t.app).get('/does-not-exist.js');
    expect(res.status).toBe(404);
    expect(res.text).not.toMatch(/<html/i);
    expect((await request(t.app).get('/recipes/12')).status).not.toBe(404);
  });

  it('when 50 anonymous visitors probe the session and fetch a token, then no session rows are stored, yet their sign-ins pass the CSRF check', async () => {
    const before = await sessionCount();
    await Promise.all(Array.from({ length: 50 }, () => request(t.app).get('/api/auth/session')));
    expect(await sessionCount()).toBe(before);
    const user = await createUser(t.db);
    const client = await ApiClient.anonymous(t.app);
    expect((await client.send('post', '/api/auth/sign-in', { email: user.email, password: user.password })).status).toBe(200);
    expect((await client.send('post', '/api/auth/sign-in', { email: user.email, password: user.password }, false)).status).toBe(403);
  });

  it('when an anonymous request echoes no token or a different one, then it is refused with 403', async () => {
    const client = await ApiClient.anonymous(t.app);
    const res = await client.agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', 'y'.repeat(32)).send({ email: 'a@test.example', password: 'x' });
    expect(res.status).toBe(403);
  });

  it('when sessions have expired, then the housekeeping purge deletes them and keeps live ones', async () => {
    const live = await ApiClient.signedIn(t.app, await createUser(t.db));
    const expired = `expired-${randomUUID()}`;
    await t.db('sessions').insert({ sid: expired, sess: JSON.stringify({ cookie: {} }), expired: new Date(Date.now() - 1000) });
    await purgeExpiredRows(t.db);
    // Other spec files write sessions meanwhile: only the row this test made is looked for.
    expect(await t.db('sessions').where({ sid: expired })).toHaveLength(0);
    expect((await live.get('/api/auth/session')).body.user).not.toBeNull();
  });

  it('when the app page is served, then its root element carries the nonce that the style policy allows, and no inline style sheet is allowed otherwise', async () => {
    const dist = join(__dirname, '..', '..', 'test-results', 'csp-test-client');
    mkdirSync(dist, { recursive: true });
    writeFileSync(join(dist, 'index.html'), '<!doctype html><html><body><cw-root></cw-root></body></html>');
    const withClient = createApp({ config: { ...t.config, clientDist: dist }, db: t.db, sessionCleanupMs: 0 });
    const first = await request(withClient.app).get('/recipes');
    const second = await request(withClient.app).get('/recipes');
    withClient.close();

    const policy = String(first.headers['content-security-policy']);
    const nonce = /style-src 'self' 'nonce-([^']+)'/.exec(policy)?.[1];
    expect(nonce).toBeDefined();
    expect(first.text).toContain(`<cw-root ngCspNonce="${nonce}">`);
    expect(policy).not.toMatch(/style-src(-elem)? [^;]*unsafe-inline/);
    expect(second.headers['content-security-policy']).not.toContain(nonce);
  });
});
