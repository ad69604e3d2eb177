import request from 'supertest';
import { readingsFromColumns } from '@shared/readings';
import { ApiClient } from './helpers/api-client';
import { startBatch } from './helpers/batch-factory';
import { createTestApp, TestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Logger push API', () => {
  let t: TestApp;
  beforeAll(() => (t = createTestApp({ pushRateLimit: { windowSeconds: 60, perToken: 5, perAddress: 1000 } })));
  afterAll(async () => {
    t.close();
    await t.db.destroy();
  });

  async function batchWithToken() {
    const client = await ApiClient.signedIn(t.app, await createUser(t.db));
    const batch = await startBatch(client);
    const issued = await client.send('post', `/api/batches/${batch.id}/push-tokens`, { label: 'Fermenter float' });
    expect(issued.status).toBe(201);
    return { client, batch, issued: issued.body };
  }
  const push = (token: string, body: object) => request(t.app).post('/api/readings/push').set('Authorization', `Bearer ${token}`).send(body);
  const readings = [{ deviceTime: '2026-11-21T08:00:00Z', value: 1.048, temperatureC: 19.5 }, { deviceTime: '2026-11-21T08:15:00Z', value: 1.047 }];

  it('when a logger pushes readings, then they are stored as pushed, and a retried POST doubles nothing', async () => {
    const { client, batch, issued } = await batchWithToken();
    expect(issued.token).toMatch(/^cwp_/);
    expect(await t.db('batch_push_tokens').where({ id: issued.id }).first()).not.toHaveProperty('token_hash', issued.token);
    const first = await push(issued.token, { readings });
    expect(first.status).toBe(200);
    expect(first.body).toEqual({ stored: 2, alreadyPresent: 0 });
    const retry = await push(issued.token, { readings });
    expect(retry.body).toEqual({ stored: 0, alreadyPresent: 2 });
    const page = (await client.get(`/api/batches/${batch.id}/readings`)).body;
    expect(page.total).toBe(2);
    expect(readingsFromColumns(page.batchId, page.columns)[0]).toMatchObject({ source: 'push', sourceDetail: 'Fermenter float', instrument: 'logger' });
    const tokens = (await client.get(`/api/batches/${batch.id}/push-tokens`)).body;
    expect(tokens[0]).not.toHaveProperty('token');
    expect(tokens[0].lastUsedAt).not.toBeNull();
  });

  it('when the token is revoked, then a push answers 401 and stores nothing', async () => {
    const { client, batch, issued } = await batchWithToken();
    expect((await client.send('delete', `/api/batches/${batch.id}/push-tokens/${issued.id}`)).status).toBe(204);
    const res = await push(issued.token, { readings });
    expect(res.status).toBe(401);
    expect(await t.db('gravity_readings').where({ batch_id: batch.id })).toHaveLength(0);
  });

  it('when the body is malformed, then it answers 400 naming the field', async () => {
    const { issued } = await batchWithToken();
    const res = await push(issued.token, { readings: [{ deviceTime: 'now', value: 7 }] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['readings.0.deviceTime', 'readings.0.value']);
  });

  it('when a token pushes more often than its cap, then it answers 429 with a retry time', async () => {
    const { issued } = await batchWithToken();
    const statuses = [];
    for (let i = 0; i < 7; i++) statuses.push((await push(issued.token, { readings: [{ deviceTime: `2026-11-21T09:0${i}:00Z`, value: 1.04 }] })).status);
    expect(statuses.slice(0, 5)).toEqual([200, 200, 200, 200, 200]);
    expect(statuses.slice(5)).toEqual([429, 429]);
  });

  it('when someone else tries to make a token for my batch, then it answers 403', async () => {
    const { batch } = await batchWithToken();
    const other = await ApiClient.signedIn(t.app, await createUser(t.db));
    expect((await other.send('post', `/api/batches/${batch.id}/push-tokens`, { label: 'x' })).status).toBe(403);
    expect((await other.get(`/api/batches/${batch.id}/push-tokens`)).status).toBe(403);
  });
});
