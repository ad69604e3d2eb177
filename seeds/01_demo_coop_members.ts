import bcrypt from 'bcryptjs';
import type { Knex } from 'knex';
import { Role } from '../shared/auth';

/** Password of every demo account; printed by `npm start`. Demo data only. */
export const DEMO_PASSWORD = 'fernhollow-demo';

/** The invented "Fernhollow Brewing Co-op": 14 people, all of them fictional. */
export const DEMO_MEMBERS: { name: string; email: string; roles: Role[] }[] = [
  { name: 'Ada Okafor', email: 'ada@fernhollow.example', roles: ['member', 'admin'] },
  { name: 'Tomás Lindqvist', email: 'tomas@fernhollow.example', roles: ['member', 'brewer'] },
  { name: 'Priya Raman', email: 'priya@fernhollow.example', roles: ['member'] },
  { name: 'Jonah Weiss', email: 'jonah@fernhollow.example', roles: ['member'] },
  { name: 'Maren Holt', email: 'maren@fernhollow.example', roles: ['member', 'brewer'] },
  { name: 'Kofi Mensah', email: 'kofi@fernhollow.example', roles: ['member'] },
  { name: 'Lucía Ferrer', email: 'lucia@fernhollow.example', roles: ['member'] },
  { name: 'Dmitri Volkov', email: 'dmitri@fernhollow.example', roles: ['member'] },
  { name: 'Aiko Tanabe', email: 'aiko@fernhollow.example', roles: ['member'] },
  { name: 'Seán Doyle', email: 'sean@fernhollow.example', roles: ['member', 'admin'] },
  { name: 'Nadia Haddad', email: 'nadia@fernhollow.example', roles: ['member'] },
  { name: 'Oskar Berg', email: 'oskar@fernhollow.example', roles: ['member'] },
  { name: 'Femi Adeyemi', email: 'femi@fernhollow.example', roles: ['member'] },
  { name: 'Greta Novak', email: 'greta@fernhollow.example', roles: ['member'] },
];

/** Adds the demo people once; a co-op that already has people is left as it is, so restarts keep your data. */
export async function seed(knex: Knex): Promise<void> {
  const existing = await knex('users').count<{ count: number }[]>({ count: '*' });
  if (Number(existing[0].count) > 0) return;
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 10);
  await knex.transaction(async (trx) => {
    for (const member of DEMO_MEMBERS) {
      const [id] = await trx('users').insert({ email: member.email, name: member.name, password_hash: passwordHash, active: true });
      await trx('user_roles').insert(member.roles.map((role) => ({ user_id: id, role })));
    }
  });
}
