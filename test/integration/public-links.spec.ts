import { createPasswordHasher, PasswordHasher } from '@server/auth';
import { createInvitationsService } from '@server/invitations';
import { createPasswordResetsService } from '@server/password-resets';
import { ApiClient } from './helpers/api-client';
import { createTestApp, TestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

const MADE_UP_TOKEN = 'x'.repeat(43);

/** A real hasher that counts how often it hashes. */
function countingHasher(): PasswordHasher & { hashes: number } {
  const real = createPasswordHasher(4);
  const counting = { ...real, hashes: 0, hash: (password: string) => ((counting.hashes += 1), real.hash(password)) };
  return counting;
}

describe('Invitation and reset links', () => {
  let t: TestApp;
  beforeAll(() => (t = createTestApp({ publicRequestLimit: { points: 5, windowSeconds: 600 } })));
  afterAll(async () => {
    t.close();
    await t.db.destroy();
  });

  it('when an invitation or reset is completed with a made-up token, then it is refused with 404 before any password is hashed', async () => {
    const hasher = countingHasher();
    const invitations = createInvitationsService({ db: t.db, hasher, publicUrl: 'http://test' });
    const resets = createPasswordResetsService({ db: t.db, hasher, publicUrl: 'http://test' });
    await expect(invitations.accept(MADE_UP_TOKEN, { name: 'X', password: 'long enough password' })).rejects.toMatchObject({ status: 404 });
    await expect(resets.complete(MADE_UP_TOKEN, 'long enough password')).rejects.toMatchObject({ status: 404 });
    expect(hasher.hashes).toBe(0);
  });

  it('when one address sends invitation acceptances past the cap, then it answers 429 with a retry time', async () => {
    const guest = await ApiClient.anonymous(t.app);
    const answers = await Promise.all(
      Array.from({ length: 16 }, () => guest.send('post', `/api/invitations/${MADE_UP_TOKEN}/acceptance`, { name: 'X', password: 'long enough password' })),
    );
    const statuses = answers.map((res) => res.status);
    expect(statuses.filter((s) => s === 404).length).toBe(5);
    expect(statuses.filter((s) => s === 429).length).toBe(11);
  });

  it('when a member is deactivated, then a reset link issued before no longer works and links they issued and sent are withdrawn', async () => {
    const admin = await createUser(t.db, ['member', 'admin']);
    const officer = await createUser(t.db, ['member', 'admin']);
    const member = await createUser(t.db);
    const adminClient = await ApiClient.signedIn(t.app, admin);
    const officerClient = await ApiClient.signedIn(t.app, officer);
    const memberLink = (await adminClient.send('post', `/api/members/${member.id}/password-reset`)).body.link as string;
    const officersLink = (await officerClient.send('post', `/api/members/${admin.id}/password-reset`)).body.link as string;
    const invitation = await officerClient.send('post', '/api/invitations', { email: `invitee-${officer.id}@test.example`, roles: ['member'] });

    expect((await adminClient.send('patch', `/api/members/${member.id}`, { active: false })).status).toBe(200);
    expect((await adminClient.send('patch', `/api/members/${officer.id}`, { active: false })).status).toBe(200);

    const guest = await ApiClient.anonymous(t.app);
    const reset = (link: string) => guest.send('post', '/api/password-resets', { token: link.split('/reset-password/')[1], password: 'a brand new password' });
    expect((await reset(memberLink)).status).toBe(404);
    expect((await reset(officersLink)).status).toBe(404);
    expect((await guest.get(`/api/invitations/${invitation.body.link.split('/invitations/')[1]}`)).status).toBe(404);
  });

  it('when a reset link is used for a member who is no longer active, then it is refused even if not withdrawn', async () => {
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));
    const member = await createUser(t.db);
    const link = (await admin.send('post', `/api/members/${member.id}/password-reset`)).body.link as string;
    await t.db('users').where({ id: member.id }).update({ active: false }); // as if deactivated by an older version
    const guest = await ApiClient.anonymous(t.app);
    const res = await guest.send('post', '/api/password-resets', { token: link.split('/reset-password/')[1], password: 'a brand new password' });
    expect(res.status).toBe(404);
  });

  it('when 20 acceptances of one invitation arrive at once, then exactly one account is made', async () => {
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));
    const email = `crowd-${Date.now()}-${Math.random()}@test.example`;
    const token = (await admin.send('post', '/api/invitations', { email, roles: ['member'] })).body.link.split('/invitations/')[1];
    const answers = await Promise.all(
      Array.from({ length: 20 }, async () => (await ApiClient.anonymous(t.app)).send('post', `/api/invitations/${token}/acceptance`, { name: 'Crowd', password: 'long enough password' })),
    );
    expect(answers.filter((res) => res.status === 201).length).toBe(1);
    expect(answers.filter((res) => res.status !== 201).every((res) => res.status === 404)).toBe(true);
    expect((await t.db('users').where({ email }).count({ n: '*' }))[0].n).toBe(1);
  });
});
