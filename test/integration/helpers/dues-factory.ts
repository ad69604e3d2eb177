import { randomUUID } from 'node:crypto';
import { Knex } from 'knex';
import { Role } from '@shared/auth';
import { DuesPeriod } from '@shared/dues';
import { createUser, TestUser } from './user-factory';

/** A plan with a unique name, so each test owns its rows. */
export async function createPlan(db: Knex, overrides: { amountCents?: number; period?: DuesPeriod } = {}): Promise<{ id: number; name: string; amountCents: number }> {
  const name = `Test plan ${randomUUID().slice(0, 8)}`;
  const amountCents = overrides.amountCents ?? 1200;
  const [id] = await db('dues_plans').insert({ name, amount_cents: amountCents, currency: 'EUR', period: overrides.period ?? 'month' });
  return { id, name, amountCents };
}

/** A fresh key per payment attempt, as the pay dialog makes one. */
export const attemptKey = () => randomUUID().replace(/-/g, '');

/** The member's paid-through date as stored (ISO), or null. */
export async function paidThroughOf(db: Knex, userId: number): Promise<string | null> {
  const row = await db('dues_memberships').where({ user_id: userId }).first();
  return row?.paid_through ? row.paid_through.toISOString().slice(0, 10) : null;
}

/** Dues paid through a date well ahead, so the person may book the kit. */
export async function givePaidUpDues(db: Knex, userId: number, daysAhead = 60): Promise<void> {
  const paidThrough = new Date(Date.now() + daysAhead * 86_400_000).toISOString().slice(0, 10);
  await db('dues_memberships').insert({ user_id: userId, paid_through: paidThrough }).onConflict('user_id').merge();
}

/** A new person whose dues are paid well ahead. */
export async function createPaidUpUser(db: Knex, roles: Role[] = ['member']): Promise<TestUser> {
  const user = await createUser(db, roles);
  await givePaidUpDues(db, user.id);
  return user;
}
