import bcrypt from 'bcryptjs';
import { randomUUID } from 'node:crypto';
import { Knex } from 'knex';
import { Role } from '@shared/auth';
import { usersRepository } from '@server/users/users.repository';

export const TEST_PASSWORD = 'correct horse battery';

export interface TestUser {
  id: number;
  email: string;
  password: string;
  roles: Role[];
}

/** Inserts a person with a unique e-mail, so tests never share rows. */
export async function createUser(db: Knex, roles: Role[] = ['member'], overrides: { name?: string; active?: boolean } = {}): Promise<TestUser> {
  const email = `${roles.join('-')}-${randomUUID()}@test.example`;
  const id = await usersRepository.create(db, {
    email,
    name: overrides.name ?? `Test ${roles.join(' ')}`,
    passwordHash: await bcrypt.hash(TEST_PASSWORD, 4),
    roles,
  });
  if (overrides.active === false) await usersRepository.update(db, id, { active: false });
  return { id, email, password: TEST_PASSWORD, roles };
}
