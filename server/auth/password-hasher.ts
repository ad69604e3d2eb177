import bcrypt from 'bcryptjs';

/** Hashes and checks passwords with bcrypt (pure JavaScript, nothing to download at install). */
export interface PasswordHasher {
  hash(password: string): Promise<string>;
  verify(password: string, hash: string): Promise<boolean>;
  /** Spends the same time as a real check, so an unknown e-mail cannot be told apart by timing. */
  verifyNothing(password: string): Promise<false>;
}

export function createPasswordHasher(cost: number): PasswordHasher {
  const decoy = bcrypt.hashSync('decoy-password-never-matches', cost);
  return {
    hash: (password) => bcrypt.hash(password, cost),
    verify: (password, hash) => bcrypt.compare(password, hash),
    verifyNothing: async (password) => {
      await bcrypt.compare(password, decoy);
      return false;
    },
  };
}
