import bcrypt from 'bcryptjs';
import { BcryptEngine, createPasswordHasher } from './password-hasher';

/** bcryptjs, with a ledger of the work of every comparison: 2^cost key-schedule rounds (the bcrypt paper, Provos & Mazières 1999). */
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

describe('createPasswordHasher', () => {
  it('when a stored hash is cheaper than the configured cost, then a wrong password costs the same work as an unknown e-mail', async () => {
    const { engine, ledger } = countingEngine();
    const hasher = createPasswordHasher(7, engine);
    const stored = await bcrypt.hash('the real password', 4);

    ledger.work = 0;
    expect(await hasher.verify('a wrong password', stored)).toBe(false);
    const wrongPasswordWork = ledger.work;
    ledger.work = 0;
    await hasher.verifyNothing('a wrong password');
    const unknownEmailWork = ledger.work;

    expect(wrongPasswordWork).toBe(2 ** 7);
    expect(unknownEmailWork).toBe(wrongPasswordWork);
  });

  it('when the stored hash has the configured cost, then only that one comparison is made and the right password matches', async () => {
    const { engine, ledger } = countingEngine();
    const hasher = createPasswordHasher(5, engine);
    const stored = await hasher.hash('the real password');
    expect(await hasher.verify('the real password', stored)).toBe(true);
    expect(ledger.work).toBe(2 ** 5);
    expect(hasher.needsRehash(stored)).toBe(false);
    expect(hasher.needsRehash(await bcrypt.hash('x', 4))).toBe(true);
  });
});
