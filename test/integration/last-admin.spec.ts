import { createApp, CreatedApp } from '@server/app';
import { ApiClient } from './helpers/api-client';
import { IsolatedDatabase, startIsolatedDatabase } from './helpers/isolated-database';
import { createUser } from './helpers/user-factory';

// Needs a database whose only admins are the test's own: the shared test database has many.
describe('The last active admin under concurrent changes', () => {
  let database: IsolatedDatabase;
  let created: CreatedApp;
  beforeAll(async () => {
    database = await startIsolatedDatabase('last-admin-test');
    created = createApp({ config: database.config, db: database.knex, sessionCleanupMs: 0 });
  }, 60_000);
  afterAll(async () => {
    created?.close();
    await database?.knex.destroy();
    database?.stop();
  });

  it.each([
    ['demote', { roles: ['member'] }],
    ['deactivate', { active: false }],
  ])('when the only two admins %s each other at the same moment, then one change is refused and one active admin remains', async (_what, change) => {
    const [first, second] = await Promise.all([createUser(database.knex, ['member', 'admin']), createUser(database.knex, ['member', 'admin'])]);
    const [a, b] = await Promise.all([ApiClient.signedIn(created.app, first), ApiClient.signedIn(created.app, second)]);

    const answers = await Promise.all([a.send('patch', `/api/members/${second.id}`, change), b.send('patch', `/api/members/${first.id}`, change)]);

    expect(answers.map((res) => res.status).sort()).toEqual([200, 409]);
    const admins = await database.knex('users').join('user_roles', 'user_roles.user_id', 'users.id').where('user_roles.role', 'admin').where('users.active', true).pluck('users.id');
    expect(admins).toHaveLength(1);
    // Leave no admin behind for the next case: it makes its own pair.
    await database.knex('user_roles').whereIn('user_id', [first.id, second.id]).where({ role: 'admin' }).delete();
  });
});
