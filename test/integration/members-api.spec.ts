import { createPasswordHasher } from '@server/auth';
import { createInvitationsService } from '@server/invitations';
import { createMembersService } from '@server/members';
import { ApiClient } from './helpers/api-client';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Members API', () => {
  const t = useTestApp();

  async function adminClient() {
    const admin = await createUser(t.db, ['member', 'admin']);
    return { admin, client: await ApiClient.signedIn(t.app, admin) };
  }

  it('when an admin lists members, then people come with their roles and active state', async () => {
    const { client } = await adminClient();
    const brewer = await createUser(t.db, ['member', 'brewer']);
    const res = await client.get('/api/members');
    expect(res.status).toBe(200);
    expect(res.body.members.find((m: { id: number }) => m.id === brewer.id)).toMatchObject({ roles: ['member', 'brewer'], active: true });
  });

  it('when an admin changes roles, then the member gets them at once and the change is audited', async () => {
    const { admin, client } = await adminClient();
    const member = await createUser(t.db);
    const memberClient = await ApiClient.signedIn(t.app, member);
    const res = await client.send('patch', `/api/members/${member.id}`, { roles: ['brewer', 'member'] });
    expect(res.status).toBe(200);
    expect(res.body.roles).toEqual(['member', 'brewer']);
    expect((await memberClient.get('/api/auth/session')).body.user.roles).toEqual(['member', 'brewer']);
    const audit = await t.db('audit_log').where({ action: 'member-updated', subject_id: member.id, actor_user_id: admin.id });
    expect(audit).toHaveLength(1);
  });

  it('when roles are invalid, then it answers 400 naming the field and changes nothing', async () => {
    const { client } = await adminClient();
    const member = await createUser(t.db);
    for (const body of [{ roles: [] }, { roles: ['wizard'] }, { active: 'yes' }, {}]) {
      const res = await client.send('patch', `/api/members/${member.id}`, body);
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.fields).length).toBeGreaterThan(0);
    }
    expect((await t.db('user_roles').where({ user_id: member.id })).map((r) => r.role)).toEqual(['member']);
  });

  it('when the member id is not a number, then it answers 400 naming memberId', async () => {
    const { client } = await adminClient();
    const res = await client.send('patch', '/api/members/abc', { active: false });
    expect(res.status).toBe(400);
    expect(res.body.fields).toHaveProperty('memberId');
  });

  it('when the last active admin would lose the role or be deactivated, then the service refuses with 409 and keeps them admin', async () => {
    const admin = await createUser(t.db, ['member', 'admin']);
    // Inside a transaction that is rolled back, so other suites running at the same time keep their admins.
    await t.db
      .transaction(async (trx) => {
        const others = trx('user_roles').where({ role: 'admin' }).whereNot({ user_id: admin.id }).select('user_id');
        await trx('users').whereIn('id', others).update({ active: false });
        const members = createMembersService(trx, createInvitationsService({ db: trx, hasher: createPasswordHasher(4), publicUrl: 'http://x' }));
        for (const change of [{ roles: ['member' as const] }, { active: false }]) {
          await expect(members.update(admin.id, admin.id, change)).rejects.toMatchObject({ status: 409, code: 'last-admin' });
        }
        expect((await trx('user_roles').where({ user_id: admin.id })).map((r) => r.role)).toContain('admin');
        throw new Error('rollback');
      })
      .catch((error: Error) => expect(error.message).toBe('rollback'));
  });

  it('when an admin deactivates a member, then that member is signed out and cannot sign in', async () => {
    const { client } = await adminClient();
    const member = await createUser(t.db);
    const memberClient = await ApiClient.signedIn(t.app, member);
    expect((await client.send('patch', `/api/members/${member.id}`, { active: false })).status).toBe(200);
    expect((await memberClient.get('/api/auth/session')).body.user).toBeNull();
    const again = await (await ApiClient.anonymous(t.app)).send('post', '/api/auth/sign-in', { email: member.email, password: member.password });
    expect(again.status).toBe(401);
  });

  it('when an admin invites a person, then the person can preview, accept, and is signed in as a member', async () => {
    const { client } = await adminClient();
    const email = `new-${Date.now()}@test.example`;
    const created = await client.send('post', '/api/invitations', { email, roles: ['member'] });
    expect(created.status).toBe(201);
    const token = created.body.link.split('/invitations/')[1];
    const guest = await ApiClient.anonymous(t.app);
    expect((await guest.get(`/api/invitations/${token}`)).body).toMatchObject({ email, roles: ['member'] });
    const accepted = await guest.send('post', `/api/invitations/${token}/acceptance`, { name: 'Wren Example', password: 'a long enough password' });
    expect(accepted.status).toBe(201);
    expect((await guest.get('/api/auth/session')).body.user).toMatchObject({ email, name: 'Wren Example', roles: ['member'] });
    const reuse = await (await ApiClient.anonymous(t.app)).send('post', `/api/invitations/${token}/acceptance`, { name: 'Someone', password: 'a long enough password' });
    expect(reuse.status).toBe(404);
    expect(await t.db('invitations').where({ email }).whereNotNull('accepted_at')).toHaveLength(1);
  });

  it('when an invitation is accepted with a short password, then it answers 400 and the invitation stays open', async () => {
    const { client } = await adminClient();
    const email = `short-${Date.now()}@test.example`;
    const token = (await client.send('post', '/api/invitations', { email, roles: ['member'] })).body.link.split('/invitations/')[1];
    const res = await (await ApiClient.anonymous(t.app)).send('post', `/api/invitations/${token}/acceptance`, { name: '', password: 'short' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['name', 'password']);
    expect((await (await ApiClient.anonymous(t.app)).get(`/api/invitations/${token}`)).status).toBe(200);
  });

  it('when an admin invites an existing member or revokes an invitation, then the answers are 409 and 204', async () => {
    const { client } = await adminClient();
    const member = await createUser(t.db);
    expect((await client.send('post', '/api/invitations', { email: member.email, roles: ['member'] })).status).toBe(409);
    const created = await client.send('post', '/api/invitations', { email: `revoke-${Date.now()}@test.example`, roles: ['member'] });
    expect((await client.send('delete', `/api/invitations/${created.body.id}`)).status).toBe(204);
    const token = created.body.link.split('/invitations/')[1];
    expect((await (await ApiClient.anonymous(t.app)).get(`/api/invitations/${token}`)).status).toBe(404);
  });

  it('when a member forgets the password, then the request is noted, an admin link resets it and old sessions end', async () => {
    const { client } = await adminClient();
    const member = await createUser(t.db);
    const oldSession = await ApiClient.signedIn(t.app, member);
    const guest = await ApiClient.anonymous(t.app);
    expect((await guest.send('post', '/api/password-resets/requests', { email: member.email })).status).toBe(202);
    expect((await guest.send('post', '/api/password-resets/requests', { email: 'nobody@test.example' })).status).toBe(202);
    const listed = (await client.get('/api/members')).body.members.find((m: { id: number }) => m.id === member.id);
    expect(listed.passwordResetRequestedAt).not.toBeNull();
    const issued = await client.send('post', `/api/members/${member.id}/password-reset`);
    expect(issued.status).toBe(201);
    const token = issued.body.link.split('/reset-password/')[1];
    expect((await guest.send('post', '/api/password-resets', { token, password: 'a brand new password' })).status).toBe(204);
    expect((await oldSession.get('/api/auth/session')).body.user).toBeNull();
    expect((await guest.send('post', '/api/password-resets', { token, password: 'a brand new password' })).status).toBe(404);
    const signIn = await (await ApiClient.anonymous(t.app)).send('post', '/api/auth/sign-in', { email: member.email, password: 'a brand new password' });
    expect(signIn.status).toBe(200);
  });
});
