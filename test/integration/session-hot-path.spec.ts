import { ApiClient } from './helpers/api-client';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

const FOURTEEN_DAYS_MS = 14 * 24 * 3600 * 1000;

describe('Signed-in requests: session reads and expiry writes', () => {
  const t = useTestApp();

  const sessionOf = (userId: number) => t.db('sessions').whereRaw("JSON_VALUE(sess, '$.passport.user') = ?", [String(userId)]).first('sid', 'expired');
  const setExpiry = (sid: string, fromNowMs: number) => t.db('sessions').where({ sid }).update({ expired: new Date(Date.now() + fromNowMs) });

  it('when a request comes within a minute of the last expiry write, then the expiry row is left as it is', async () => {
    const user = await createUser(t.db);
    const client = await ApiClient.signedIn(t.app, user);
    const { sid } = await sessionOf(user.id);
    await setExpiry(sid, FOURTEEN_DAYS_MS - 30_000);
    const before = (await sessionOf(user.id)).expired as Date;
    expect((await client.get('/api/auth/session')).body.user.id).toBe(user.id);
    expect(((await sessionOf(user.id)).expired as Date).getTime()).toBe(before.getTime());
  });

  it('when the expiry would move by more than a minute, then the request moves it forward', async () => {
    const user = await createUser(t.db);
    const client = await ApiClient.signedIn(t.app, user);
    const { sid } = await sessionOf(user.id);
    await setExpiry(sid, FOURTEEN_DAYS_MS - 5 * 60_000);
    const asked = Date.now();
    await client.get('/api/auth/session');
    const moved = ((await sessionOf(user.id)).expired as Date).getTime();
    expect(moved).toBeGreaterThanOrEqual(asked + FOURTEEN_DAYS_MS - 2000);
  });

  it('when an admin changes roles or deactivates the person, then their next request sees it at once', async () => {
    const user = await createUser(t.db, ['member']);
    const client = await ApiClient.signedIn(t.app, user);
    expect((await client.get('/api/auth/session')).body.user.roles).toEqual(['member']);
    await t.db('user_roles').insert({ user_id: user.id, role: 'brewer' });
    expect((await client.get('/api/auth/session')).body.user.roles).toEqual(['member', 'brewer']);
    await t.db('users').where({ id: user.id }).update({ active: false });
    expect((await client.get('/api/auth/session')).body.user).toBeNull();
  });
});
