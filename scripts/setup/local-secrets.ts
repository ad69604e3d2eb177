import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/** Secrets of one local environment, made once and kept beside its data (git-ignored). */
export interface LocalSecrets {
  dbPassword: string;
  sessionSecret: string;
}

export function readOrCreateSecrets(home: string): LocalSecrets {
  const file = join(home, 'secrets.json');
  if (existsSync(file)) return JSON.parse(readFileSync(file, 'utf8')) as LocalSecrets;
  mkdirSync(home, { recursive: true });
  const secrets = { dbPassword: randomBytes(18).toString('hex'), sessionSecret: randomBytes(32).toString('hex') };
  writeFileSync(file, JSON.stringify(secrets, null, 2), { mode: 0o600 });
  return secrets;
}
