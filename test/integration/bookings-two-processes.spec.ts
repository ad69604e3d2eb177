import { createDb } from '@server/db';
import { Knex } from 'knex';
import { ApiClient } from './helpers/api-client';
import { createKitItem, wallClockFromToday } from './helpers/kit-factory';
import { startServerProcess, ServerProcess } from './helpers/server-process';
import { testConfig } from './helpers/test-app';
import { givePaidUpDues } from './helpers/dues-factory';
import { createUser } from './helpers/user-factory';

describe('Bookings across two server processes on one database', () => {
  let db: Knex;
  let servers: ServerProcess[] = [];
  beforeAll(async () => {
    db = createDb(testConfig().db);
    servers = await Promise.all([startServerProcess({}), startServerProcess({})]);
  }, 90_000);
  afterAll(async () => {
    await Promise.all(servers.map((server) => server.stop()));
    await db.destroy();
  });

  it('when 50 overlapping requests for one item are split between two processes, then exactly one succeeds and 49 answer 409', async () => {
    const zone = testConfig().coopTimeZone;
    const item = await createKitItem(db);
    const clients = await Promise.all(
      servers.map(async (server) => {
        const user = await createUser(db);
        await givePaidUpDues(db, user.id);
        return ApiClient.signedIn(server.baseUrl, user);
      }),
    );

    const responses = await Promise.all(
      Array.from({ length: 50 }, (_, i) =>
        clients[i % 2].send('post', '/api/bookings', {
          kitItemId: item.id,
          start: wallClockFromToday(zone, 25, 8, i),
          end: wallClockFromToday(zone, 26, 8, i),
        }),
      ),
    );

    const created = responses.filter((res) => res.status === 201);
    expect(created).toHaveLength(1);
    expect(responses.filter((res) => res.status === 409)).toHaveLength(49);
    expect(responses.filter((res) => res.status === 409).every((res) => res.body.error.details.conflict.id === created[0].body.id)).toBe(true);
    expect(await db('bookings').where({ kit_item_id: item.id })).toHaveLength(1);
  });
});
