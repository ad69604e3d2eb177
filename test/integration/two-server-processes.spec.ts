import request from 'supertest';
import { CSRF_HEADER } from '@server/auth';
import { ApiClient, randomClientAddress } from './helpers/api-client';
import { createCatalogueEntries, sampleDesign } from './helpers/catalogue-factory';
import { ServerProcess, startServerProcess } from './helpers/server-process';
import { createTestApp, TestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

/** A request from `client` (its cookies, token and address) sent to another server process. */
function sendVia(server: ServerProcess, client: ApiClient, method: 'post' | 'put', path: string, body: object) {
  return request(server.baseUrl)[method](path)
    .set('Cookie', client.cookieHeader())
    .set(CSRF_HEADER, client.csrfToken())
    .set('X-Forwarded-For', client.address)
    .send(body);
}

describe('Two server processes on one database', () => {
  let t: TestApp;
  let servers: ServerProcess[];
  beforeAll(async () => {
    t = createTestApp();
    servers = await Promise.all([startServerProcess(), startServerProcess()]);
  }, 60_000);
  afterAll(async () => {
    await Promise.all((servers ?? []).map((server) => server.stop()));
    t.close();
    await t.db.destroy();
  });

  it('when 40 wrong passwords for one account from one address are split between the processes, then at most 5 are checked (default limit)', async () => {
    const user = await createUser(t.db);
    const address = randomClientAddress();
    const clients = await Promise.all(servers.map((server) => ApiClient.anonymous(server.baseUrl, address)));
    const answers = await Promise.all(
      Array.from({ length: 40 }, (_, i) => clients[i % 2].send('post', '/api/auth/sign-in', { email: user.email, password: 'a wrong password' })),
    );
    const statuses = answers.map((res) => res.status);
    expect(statuses.filter((s) => s === 401).length).toBeLessThanOrEqual(5);
    expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(35);
  });

  it('when 40 password-reset requests from one address are split between the processes, then exactly the cap of 20 is served', async () => {
    const address = randomClientAddress();
    const clients = await Promise.all(servers.map((server) => ApiClient.anonymous(server.baseUrl, address)));
    const answers = await Promise.all(
      Array.from({ length: 40 }, (_, i) => clients[i % 2].send('post', '/api/password-resets/requests', { email: `nobody-${i}@test.example` })),
    );
    const statuses = answers.map((res) => res.status);
    expect(statuses.filter((s) => s === 202).length).toBe(20);
    expect(statuses.filter((s) => s === 429).length).toBe(20);
  });

  it('when 30 saves of one recipe are split between the processes, then the versions are 1 to 31 with no gap or repeat', async () => {
    const ids = await createCatalogueEntries(t.db);
    const owner = await ApiClient.signedIn(servers[0].baseUrl, await createUser(t.db));
    const created = await owner.send('post', '/api/recipes', { design: sampleDesign(ids), visibility: 'private' });
    expect(created.status).toBe(201);
    const answers = await Promise.all(
      // Each save differs from version 1 (20 L) and from the others: a save equal to the current version makes none.
      Array.from({ length: 30 }, (_, i) => sendVia(servers[i % 2], owner, 'put', `/api/recipes/${created.body.id}`, { design: { ...sampleDesign(ids), batchVolumeLitres: 21 + i } })),
    );
    expect(answers.map((res) => res.status).filter((s) => s !== 200)).toEqual([]);
    const versions = await t.db('recipe_versions').where({ recipe_id: created.body.id }).orderBy('version').pluck('version');
    expect(versions).toEqual(Array.from({ length: 31 }, (_, i) => i + 1));
    expect(servers.every((server) => server.alive())).toBe(true);
  });
});
