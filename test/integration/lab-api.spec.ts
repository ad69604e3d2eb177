import { randomUUID } from 'node:crypto';
import { ApiClient } from './helpers/api-client';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Lab API: tolerance classes', () => {
  const t = useTestApp();

  const unique = (name: string) => `${name} ${randomUUID().slice(0, 8)}`;

  it('when an admin adds and changes a product class, then everyone reads its tolerance', async () => {
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));
    const created = await admin.send('post', '/api/lab/tolerance-classes', { name: unique('Beer up to 5.5 %'), tolerancePercentVolume: 0.5, note: '' });
    expect(created.status).toBe(201);
    const changed = await admin.send('put', `/api/lab/tolerance-classes/${created.body.id}`, { ...created.body, tolerancePercentVolume: 1 });
    expect(changed.body).toMatchObject({ tolerancePercentVolume: 1, retired: false });
    const member = await ApiClient.signedIn(t.app, await createUser(t.db));
    const listed = (await member.get('/api/lab/tolerance-classes')).body.find((c: { id: number }) => c.id === created.body.id);
    expect(listed.tolerancePercentVolume).toBe(1);
  });

  it('when a brewer adds a product class, then it answers 403', async () => {
    const brewer = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'brewer']));
    expect((await brewer.send('post', '/api/lab/tolerance-classes', { name: unique('x'), tolerancePercentVolume: 0.5 })).status).toBe(403);
  });

  it('when a tolerance is absurd or a name taken, then it answers 400 or 409 and keeps the stored class', async () => {
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['admin']));
    const name = unique('Strong beer');
    const created = await admin.send('post', '/api/lab/tolerance-classes', { name, tolerancePercentVolume: 1 });
    const bad = await admin.send('put', `/api/lab/tolerance-classes/${created.body.id}`, { name, tolerancePercentVolume: 50 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toEqual(['tolerancePercentVolume']);
    expect((await admin.send('post', '/api/lab/tolerance-classes', { name, tolerancePercentVolume: 1 })).status).toBe(409);
    expect(Number((await t.db('tolerance_classes').where({ id: created.body.id }).first())!.tolerance_percent_volume)).toBe(1);
  });
});
