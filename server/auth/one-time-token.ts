import { createHash, randomBytes } from 'node:crypto';

/** A secret for a link (invitation, password reset); only its hash is stored. */
export function createOneTimeToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashOneTimeToken(token) };
}

export function hashOneTimeToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
