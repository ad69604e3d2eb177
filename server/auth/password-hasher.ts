import bcrypt from 'bcryptjs';

/** The bcrypt functions the hasher uses (bcryptjs: pure JavaScript, nothing to download at install). */
export interface BcryptEngine {
  hash(password: string, cost: number): Promise<string>;
  compare(password: string, hash: string): Promise<boolean>;
  getRounds(hash: string): number;
}

/** Hashes and checks passwords; every check costs the same work whatever the stored hash's cost. */
export interface PasswordHasher {
  hash(password: string): Promise<string>;
  verify(password: string, hash: string): Promise<boolean>;
  /** The work of a real check, for an unknown e-mail, so it cannot be told apart by timing. */
  verifyNothing(password: string): Promise<false>;
  /** True when the hash was made with another cost than the configured one (rehash it at the next sign-in). */
  needsRehash(hash: string): boolean;
}

export function createPasswordHasher(cost: number, engine: BcryptEngine = bcrypt): PasswordHasher {
  const decoys = new Map<number, Promise<string>>();
  const decoy = (rounds: number) => {
    if (!decoys.has(rounds)) decoys.set(rounds, engine.hash('decoy-password-never-matches', rounds));
    return decoys.get(rounds)!;
  };
  const compareDecoy = async (password: string, rounds: number) => {
    await engine.compare(password, await decoy(rounds));
  };
  return {
    hash: (password) => engine.hash(password, cost),
    async verify(password, hash) {
      const matches = await engine.compare(password, hash);
      // bcrypt's work is 2^cost; an older, cheaper hash is topped up to 2^cost with decoys of
      // costs stored … cost−1 (2^s + 2^s + 2^(s+1) + … + 2^(c−1) = 2^c).
      for (let rounds = Math.max(4, engine.getRounds(hash)); rounds < cost; rounds++) await compareDecoy(password, rounds);
      return matches;
    },
    async verifyNothing(password) {
      await compareDecoy(password, cost);
      return false;
    },
    needsRehash: (hash) => engine.getRounds(hash) !== cost,
  };
}
