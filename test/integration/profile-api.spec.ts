import { ApiClient } from './helpers/api-client';
import { useTestApp } from './helpers/test-app';
import { createUser, TEST_PASSWORD } from './helpers/user-factory';

describe('Profile API', () => {
  const t = useTestApp();

  it('when a person changes their name and units, then the profile and the session show them and the change is audited', async () => {
    const user = await createUser(t.db);
    const client = await ApiClient.signedIn(t.app, user);

    const res = await client.send('put', '/api/profile', { name: '  Ada Okafor  ', unitSystem: 'us' });

    expect(res.status).toBe(200);
    expect(res.body).toEqual({ name: 'Ada Okafor', email: user.email, unitSystem: 'us' });
    expect((await client.get('/api/auth/session')).body.user.name).toBe('Ada Okafor');
    expect((await client.get('/api/preferences')).body).toEqual({ unitSystem: 'us' });
    expect(await t.db('audit_log').where({ action: 'profile-changed', subject_id: user.id })).toHaveLength(1);
  });

  it('when the name is empty or the units unknown, then it answers 400 naming both and keeps the profile', async () => {
    const user = await createUser(t.db, ['member'], { name: 'Kept Name' });
    const client = await ApiClient.signedIn(t.app, user);

    const res = await client.send('put', '/api/profile', { name: ' ', unitSystem: 'imperial' });

    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['name', 'unitSystem']);
    expect((await client.get('/api/profile')).body.name).toBe('Kept Name');
  });

  it('when the current password is wrong, then it answers 400 on that field and the password stays', async () => {
    const user = await createUser(t.db);
    const client = await ApiClient.signedIn(t.app, user);

    const res = await client.send('put', '/api/profile/password', { currentPassword: 'not the password', newPassword: 'a brand new passphrase' });

    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ currentPassword: 'does not match your password' });
    await expect(ApiClient.signedIn(t.app, user)).resolves.toBeInstanceOf(ApiClient);
  });

  it('when the password is changed, then the new one signs in, the old one does not, and only this session survives', async () => {
    const user = await createUser(t.db);
    const here = await ApiClient.signedIn(t.app, user);
    const elsewhere = await ApiClient.signedIn(t.app, user);

    const res = await here.send('put', '/api/profile/password', { currentPassword: TEST_PASSWORD, newPassword: 'a brand new passphrase' });

    expect(res.status).toBe(204);
    expect((await here.get('/api/auth/session')).body.user?.id).toBe(user.id);
    expect((await elsewhere.get('/api/auth/session')).body.user).toBeNull();
    await expect(ApiClient.signedIn(t.app, user)).rejects.toThrow(/sign-in failed/);
    await expect(ApiClient.signedIn(t.app, { ...user, password: 'a brand new passphrase' })).resolves.toBeInstanceOf(ApiClient);
    expect(await t.db('audit_log').where({ action: 'password-changed', subject_id: user.id })).toHaveLength(1);
  });
});
