import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { ApiClient } from './helpers/api-client';
import { createCatalogueEntries, sampleDesign } from './helpers/catalogue-factory';
import { IsolatedDatabase, startIsolatedDatabase } from './helpers/isolated-database';
import { ServerProcess, startServerProcess } from './helpers/server-process';
import { createUser } from './helpers/user-factory';

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** What the load loop saw: every status, and the ids of recipes whose creation was confirmed. */
interface LoadRecord {
  statuses: number[];
  confirmedIds: number[];
  badBodies: string[];
}

/** Waits until `done()` holds, checking every 50 ms; fails naming what it waited for. */
async function until(done: () => boolean, timeoutMs: number, what: string): Promise<void> {
  const start = Date.now();
  while (!done()) {
    if (Date.now() - start > timeoutMs) throw new Error(`Waited ${timeoutMs} ms for ${what}`);
    await pause(50);
  }
}

/** Signed-in members reading the recipe list and creating recipes until `running()` turns false. */
async function runLoad(clients: ApiClient[], design: object, running: () => boolean, record: LoadRecord): Promise<void> {
  await Promise.all(
    clients.map(async (client, i) => {
      for (let n = 0; running(); n++) {
        const res = n % 2 ? await client.get('/api/recipes') : await client.send('post', '/api/recipes', { design: { ...design, name: `Load ${i}-${n}` }, visibility: 'private' });
        record.statuses.push(res.status);
        if (res.status === 201) record.confirmedIds.push(res.body.id);
        if (res.status >= 500 && !(res.status === 503 && typeof res.body?.error?.message === 'string')) record.badBodies.push(`${res.status} ${res.text}`);
        await pause(5);
      }
    }),
  );
}

describe('Database outage', () => {
  let database: IsolatedDatabase;
  let server: ServerProcess;
  beforeAll(async () => {
    database = await startIsolatedDatabase('outage-test');
    // A stand-in for the built client, so static serving is checked without a build.
    const client = join(__dirname, '..', '..', 'test-results', 'outage-test-client');
    mkdirSync(client, { recursive: true });
    writeFileSync(join(client, 'index.html'), '<!doctype html><html><body><cw-root></cw-root><script src="main.js"></script></body></html>');
    writeFileSync(join(client, 'main.js'), 'console.log("app");');
    server = await startServerProcess({ CLIENT_DIST: client, LOG_LEVEL: 'info' }, database.config);
  }, 60_000);
  afterAll(async () => {
    await server?.stop();
    await database?.knex.destroy();
    database?.stop();
  });

  it('when the database is killed under load and restarted, then the server lives, answers 503 JSON meanwhile, recovers, and loses no confirmed write', async () => {
    const ids = await createCatalogueEntries(database.knex);
    const clients = await Promise.all([0, 1, 2, 3].map(async () => ApiClient.signedIn(server.baseUrl, await createUser(database.knex))));
    const record: LoadRecord = { statuses: [], confirmedIds: [], badBodies: [] };
    let running = true;
    const load = runLoad(clients, sampleDesign(ids), () => running, record);

    // Counted, not timed: a loaded machine may confirm few writes in a fixed pause.
    await until(() => record.confirmedIds.length >= 3, 20_000, 'three confirmed writes before the outage');
    await database.kill();
    await pause(500);
    const during = {
      health: await request(server.baseUrl).get('/api/health'),
      recipes: await clients[0].get('/api/recipes'),
      page: await request(server.baseUrl).get('/recipes'),
      script: await request(server.baseUrl).get('/main.js'),
      probe: await request(server.baseUrl).get('/api/auth/session'),
    };
    await pause(1000);
    await database.restart();
    const restartedAt = Date.now();
    let recoveredAfterMs = -1;
    while (Date.now() - restartedAt < 15_000) {
      if ((await clients[1].get('/api/recipes')).status === 200) {
        recoveredAfterMs = Date.now() - restartedAt;
        break;
      }
      await pause(100);
    }
    const confirmedBeforeRecovery = record.confirmedIds.length;
    await until(() => record.confirmedIds.length >= confirmedBeforeRecovery + 2, 15_000, 'two confirmed writes after the restart');
    running = false;
    await load;

    expect(server.alive()).toBe(true);
    expect(during.health.status).toBe(503);
    expect(during.health.body).toEqual({ status: 'degraded', database: 'down' });
    expect(during.recipes.status).toBe(503);
    expect(during.recipes.body.error.message).toMatch(/database/);
    expect([during.page.status, during.script.status, during.probe.status]).toEqual([200, 200, 200]);
    expect(during.page.text).toContain('<cw-root');
    expect(recoveredAfterMs).toBeGreaterThanOrEqual(0);
    expect(recoveredAfterMs).toBeLessThan(10_000);
    expect(record.statuses.filter((s) => s === 503).length).toBeGreaterThan(0);
    expect(record.statuses.filter((s) => s !== 200 && s !== 201 && s !== 503)).toEqual([]);
    expect(record.badBodies).toEqual([]);
    expect(record.confirmedIds.length).toBeGreaterThan(4);
    const stored = await database.knex('recipes').whereIn('id', record.confirmedIds).pluck('id');
    expect(stored.sort()).toEqual([...record.confirmedIds].sort());
    expect(server.output()).not.toMatch(/unhandled promise rejection|uncaught/);
  }, 90_000);
});
