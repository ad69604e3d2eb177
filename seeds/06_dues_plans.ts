import type { Knex } from 'knex';
import { DateTime } from 'luxon';

/** The demo co-op's plans (invented figures, demo data only). */
export const DEMO_DUES_PLANS = [
  { name: 'Standard', amount_cents: 1200, currency: 'EUR', period: 'month' as const },
  { name: 'Supporter', amount_cents: 2500, currency: 'EUR', period: 'month' as const },
];

/** Adds the demo plans once, and gives the demo people paid-up dues (one lapsed) so the kit room can be tried at once. */
export async function seed(knex: Knex): Promise<void> {
  const plans = await knex('dues_plans').count<{ count: number }[]>({ count: '*' });
  if (Number(plans[0].count) > 0) return;
  await knex('dues_plans').insert(DEMO_DUES_PLANS);
  const standard = await knex('dues_plans').where({ name: 'Standard' }).first('id');
  const demoPeople = await knex('users').where('email', 'like', '%@fernhollow.example').orderBy('id').select('id', 'email');
  const today = DateTime.utc();
  const rows = demoPeople.map((person) => ({
    user_id: person.id,
    plan_id: standard!.id,
    // Greta's dues lapsed last week in the demo, to show a refused booking.
    paid_through: (person.email === 'greta@fernhollow.example' ? today.minus({ days: 7 }) : today.plus({ days: 20 })).toISODate(),
  }));
  if (rows.length) await knex('dues_memberships').insert(rows);
}
