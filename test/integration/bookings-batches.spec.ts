import { ApiClient } from './helpers/api-client';
import { startBatch } from './helpers/batch-factory';
import { givePaidUpDues } from './helpers/dues-factory';
import { createKitItem, wallClockFromToday } from './helpers/kit-factory';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Bookings API with batches', () => {
  const t = useTestApp();

  it('when a batch is fermenting in a fermenter, then bookings of it are refused naming the batch, except one serving that batch', async () => {
    const zone = t.config.coopTimeZone;
    const item = await createKitItem(t.db);
    const brewer = await createUser(t.db);
    const otherMember = await createUser(t.db);
    await givePaidUpDues(t.db, brewer.id);
    await givePaidUpDues(t.db, otherMember.id);
    const brewerClient = await ApiClient.signedIn(t.app, brewer);
    const other = await ApiClient.signedIn(t.app, otherMember);
    const batch = await startBatch(brewerClient, { name: 'Porch pale', fermenterId: item.id });
    const moved = await brewerClient.send('post', `/api/batches/${batch.id}/status`, { status: 'fermenting', confirmSkip: true });
    expect(moved.status).toBe(200);
    const times = { start: wallClockFromToday(zone, 3, 10), end: wallClockFromToday(zone, 4, 10) };

    const refused = await other.send('post', '/api/bookings', { kitItemId: item.id, ...times });
    const forTheBatch = await brewerClient.send('post', '/api/bookings', { kitItemId: item.id, batchId: batch.id, ...times });
    const notMine = await other.send('post', '/api/bookings', { kitItemId: item.id, batchId: batch.id, ...times });

    expect(refused.status).toBe(409);
    expect(refused.body.error.details.conflict).toMatchObject({ kind: 'batch', id: batch.id, batchName: 'Porch pale' });
    expect(forTheBatch.status).toBe(201);
    expect(forTheBatch.body.batchId).toBe(batch.id);
    expect(notMine.status).toBe(400);
    expect(notMine.body.fields).toHaveProperty('batchId');
  });

  const brewerAndOther = async () => {
    const brewer = await createUser(t.db);
    const otherMember = await createUser(t.db);
    await givePaidUpDues(t.db, brewer.id);
    await givePaidUpDues(t.db, otherMember.id);
    return { otherId: otherMember.id, brewer: await ApiClient.signedIn(t.app, brewer), other: await ApiClient.signedIn(t.app, otherMember) };
  };

  it("when a batch moves into fermenting while another member's booking of its fermenter is still held, then it answers 409 naming that booking and stays where it was", async () => {
    const zone = t.config.coopTimeZone;
    const item = await createKitItem(t.db);
    const { brewer, other } = await brewerAndOther();
    const batch = await startBatch(brewer, { name: 'Cellar saison', fermenterId: item.id });
    const serving = await brewer.send('post', '/api/bookings', { kitItemId: item.id, batchId: batch.id, start: wallClockFromToday(zone, 1, 9), end: wallClockFromToday(zone, 2, 9) });
    const others = await other.send('post', '/api/bookings', { kitItemId: item.id, start: wallClockFromToday(zone, 10, 9), end: wallClockFromToday(zone, 11, 9) });
    expect([serving.status, others.status]).toEqual([201, 201]);

    const refused = await brewer.send('post', `/api/batches/${batch.id}/status`, { status: 'fermenting', confirmSkip: true });

    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('booking-conflict');
    expect(refused.body.error.details.conflict).toMatchObject({ kind: 'booking', id: others.body.id, kitItemCode: item.code });
    expect(refused.body.error.message).toContain(`booking #${others.body.id}`);
    expect((await t.db('batches').where({ id: batch.id }).first())?.status).toBe('planned');
    expect(await t.db('audit_log').where({ subject_type: 'batch', subject_id: batch.id, action: 'batch-status-moved' })).toHaveLength(0);

    // Once the other booking is gone, the booking that serves the batch does not stand in its way.
    expect((await other.send('delete', `/api/bookings/${others.body.id}`)).status).toBe(204);
    const moved = await brewer.send('post', `/api/batches/${batch.id}/status`, { status: 'fermenting', confirmSkip: true });
    expect(moved.status).toBe(200);
  });

  it('when a booking that has ended before the move date is on record, then the batch moves into fermenting', async () => {
    const item = await createKitItem(t.db);
    const { brewer, otherId } = await brewerAndOther();
    const batch = await startBatch(brewer, { fermenterId: item.id });
    const past = { startsAt: new Date('2026-11-01T08:00:00Z'), endsAt: new Date('2026-11-02T08:00:00Z'), heldUntil: new Date('2026-11-03T08:00:00Z') };
    await t.db('bookings').insert({ kit_item_id: item.id, user_id: otherId, created_by_user_id: otherId, purpose: 'use', starts_at: past.startsAt, ends_at: past.endsAt, held_until: past.heldUntil, time_zone: t.config.coopTimeZone, note: '', batch_id: null });

    const atHoldEnd = await brewer.send('post', `/api/batches/${batch.id}/status`, { status: 'fermenting', confirmSkip: true, at: '2026-11-03T08:00:00Z' });

    expect(atHoldEnd.status).toBe(200);
  });

  it('when a batch moves into fermenting and a member books its fermenter at the same moment, then exactly one of them succeeds', async () => {
    const zone = t.config.coopTimeZone;
    for (let round = 0; round < 5; round++) {
      const item = await createKitItem(t.db);
      const { brewer, other } = await brewerAndOther();
      const batch = await startBatch(brewer, { fermenterId: item.id });

      const [move, booking] = await Promise.all([
        brewer.send('post', `/api/batches/${batch.id}/status`, { status: 'fermenting', confirmSkip: true }),
        other.send('post', '/api/bookings', { kitItemId: item.id, start: wallClockFromToday(zone, 5, 9), end: wallClockFromToday(zone, 6, 9) }),
      ]);

      expect([`${move.status}/${booking.status}`]).toEqual([move.status === 200 ? '200/409' : '409/201']);
      const fermenting = (await t.db('batches').where({ id: batch.id }).first())?.status === 'fermenting';
      const booked = (await t.db('bookings').where({ kit_item_id: item.id }).whereNull('cancelled_at')).length;
      expect(Number(fermenting) + booked).toBe(1);
    }
  });
});
