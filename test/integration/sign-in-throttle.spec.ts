import bcrypt from 'bcryptjs';
import { createAuthService, createPasswordHasher } from '@server/auth';
import { BcryptEngine } from '@server/auth/password-hasher';
import { ApiClient } from './helpers/api-client';
import { createTestApp, TestApp, useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Sign-in throttle', () => {
  let t: TestApp;
  beforeAll(() => (t = createTestApp({ signInLimits: { perAccountAndAddress: 5, windowSeconds: 600, perAddress: 1000, addressWindowSeconds: 60 } })));
  afterAll(async () => {
    t.close();
    await t.db.destroy();
  });

  const signIn = (client: ApiClient, email: string, password: string) => client.send('post', '/api/auth/sign-in', { email, password });

  it('when 100 wrong passwords for one account arrive at once from one address, then at most 5 are checked and the rest get 429', async () => {
    const user = await createUser(t.db);
    const client = await ApiClient.anonymous(t.app);
    const answers = await Promise.all(Array.from({ length: 100 }, () => signIn(client, user.email, 'a wrong password')));
    const statuses = answers.map((res) => res.status);
    expect(statuses.filter((s) => s === 401).length).toBeLessThanOrEqual(5);
    expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(95);
    expect(statuses.every((s) => s === 401 || s === 429)).toBe(true);
  });

  it('when failures on other accounts use up the address limit, then a member behind the same address is refused only for the short address window', async () => {
    const nat = createTestApp({ db: t.db, signInLimits: { perAccountAndAddress: 5, windowSeconds: 600, perAddress: 8, addressWindowSeconds: 2 } });
    const member = await createUser(t.db);
    const attacker = await ApiClient.anonymous(nat.app);
    const colleague = await ApiClient.anonymous(nat.app, attacker.address);
    for (let i = 0; i < 8; i++) await signIn(attacker, `someone-${i}@test.example`, 'guess');
    const blocked = await signIn(colleague, member.email, member.password);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.retryAfterSeconds).toBeLessThanOrEqual(2);
    await new Promise((resolve) => setTimeout(resolve, 2100));
    expect((await signIn(colleague, member.email, member.password)).status).toBe(200);
    nat.close();
  });

  it('when the same account is tried from another address, then that address is still allowed', async () => {
    const user = await createUser(t.db);
    const first = await ApiClient.anonymous(t.app);
    for (let i = 0; i < 5; i++) await signIn(first, user.email, 'wrong');
    expect((await signIn(first, user.email, user.password)).status).toBe(429);
    expect((await signIn(await ApiClient.anonymous(t.app), user.email, user.password)).status).toBe(200);
  });

  it('when a sign-in succeeds, then the account counter starts again', async () => {
    const user = await createUser(t.db);
    const client = await ApiClient.anonymous(t.app);
    for (let i = 0; i < 4; i++) await signIn(client, user.email, 'wrong');
    expect((await signIn(client, user.email, user.password)).status).toBe(200);
    await client.send('post', '/api/auth/sign-out');
    for (let i = 0; i < 4; i++) expect((await signIn(client, user.email, 'wrong')).status).toBe(401);
  });
});

describe('Sign-in work for known and unknown e-mails', () => {
  const t = useTestApp();

  /** bcryptjs with a ledger of the work of each comparison: 2^cost rounds (Provos & Mazières, "A Future-Adaptable Password Scheme", 1999). */
  function countingEngine() {
    const ledger = { work: 0 };
    const engine: BcryptEngine = {
      hash: (password, cost) => bcrypt.hash(password, cost),
      getRounds: (hash) => bcrypt.getRounds(hash),
      compare: (password, hash) => {
        ledger.work += 2 ** bcrypt.getRounds(hash);
        return bcrypt.compare(password, hash);
      },
    };
    return { engine, ledger };
  }

  it('when a stored hash was made at a lower cost, then a wrong password costs the same work as an unknown e-mail, and a right one rehashes at the current cost', async () => {
    const user = await createUser(t.db); // stored at cost 4
    const { engine, ledger } = countingEngine();
    const auth = createAuthService(t.db, createPasswordHasher(6, engine));

    ledger.work = 0;
    expect(await auth.verifyCredentials(user.email, 'a wrong password')).toBeNull();
    const wrongPassword = ledger.work;
    ledger.work = 0;
    expect(await auth.verifyCredentials(`nobody-${user.id}@test.example`, 'a wrong password')).toBeNull();
    const unknownEmail = ledger.work;
    expect(wrongPassword).toBe(unknownEmail);

    expect(await auth.verifyCredentials(user.email, user.password)).toMatchObject({ id: user.id });
    const stored = await t.db('users').where({ id: user.id }).first('password_hash');
    expect(bcrypt.getRounds(stored!.password_hash)).toBe(6);
  });
});
