import { randomUUID } from 'node:crypto';
import { ApiClient } from './helpers/api-client';
import { createKitItem } from './helpers/kit-factory';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Kit API', () => {
  const t = useTestApp();

  const admin = async () => ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));

  it('when an admin adds an item and takes it out of service, then the register shows it and the change is audited', async () => {
    const client = await admin();
    const code = `K${randomUUID().slice(0, 6)}`;

    const created = await client.send('post', '/api/kit', { code, name: 'Test kettle', kind: 'kettle', capacityLitres: 50, state: 'in_service', turnaroundHours: 4, notes: '' });
    const changed = await client.send('patch', `/api/kit/${created.body.id}`, { state: 'maintenance' });
    const duplicate = await client.send('post', '/api/kit', { code, name: 'Other', kind: 'other', capacityLitres: null, state: 'in_service', turnaroundHours: 0 });

    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ code, capacityLitres: 50, turnaroundHours: 4 });
    expect(changed.body.state).toBe('maintenance');
    expect(duplicate.status).toBe(409);
    expect(duplicate.body.fields).toHaveProperty('code');
    const listed = (await client.get('/api/kit')).body.find((item: { id: number }) => item.id === created.body.id);
    expect(listed.state).toBe('maintenance');
    expect(await t.db('audit_log').where({ subject_type: 'kit_item', subject_id: created.body.id })).toHaveLength(2);
  });

  it('when an admin logs maintenance, then the log lists it newest first and the register shows the next due date', async () => {
    const client = await admin();
    const item = await createKitItem(t.db);

    await client.send('post', `/api/kit/${item.id}/maintenance`, { performedOn: '2026-10-01', work: 'Replaced the valve seals', performedBy: 'Test fitter', nextDueOn: '2027-04-01' });
    const latest = await client.send('post', `/api/kit/${item.id}/maintenance`, { performedOn: '2026-11-15', work: 'Passivated the cone', performedBy: 'Test fitter', nextDueOn: '2027-05-15' });
    const log = await client.get(`/api/kit/${item.id}/maintenance`);

    expect(latest.status).toBe(201);
    expect(log.body.map((e: { performedOn: string }) => e.performedOn)).toEqual(['2026-11-15', '2026-10-01']);
    const listed = (await client.get('/api/kit')).body.find((each: { id: number }) => each.id === item.id);
    expect(listed.nextMaintenanceDueOn).toBe('2027-05-15');
  });

  it('when an entry is absurd, then it answers 400 naming each field and stores nothing', async () => {
    const client = await admin();
    const item = await createKitItem(t.db);

    const res = await client.send('post', `/api/kit/${item.id}/maintenance`, { performedOn: '2026-13-01', work: '', performedBy: 'X', nextDueOn: null });
    const badItem = await client.send('patch', `/api/kit/${item.id}`, { turnaroundHours: -1, capacityLitres: 0 });

    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['performedOn', 'work']);
    expect(Object.keys(badItem.body.fields).sort()).toEqual(['capacityLitres', 'turnaroundHours']);
    expect(await t.db('kit_maintenance_entries').where({ kit_item_id: item.id })).toHaveLength(0);
  });
});
