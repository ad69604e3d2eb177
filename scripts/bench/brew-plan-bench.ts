// The brew plan's proposals against loading the same rows, in the same run: 6 fermenters over
// 52 weeks with 200 planned batches and 400 bookings on record (all invented for the bench). The
// four 30 L fermenters are kept full; the two 60 L ones have a gap of about two weeks now and then.
import { randomUUID } from 'node:crypto';
import { Knex } from 'knex';
import { DateTime } from 'luxon';
import { BOOKING_LIMITS } from '@shared/bookings';
import { BREW_PLAN_LIMITS, proposeSlots } from '@shared/brew-plan';
import { loadPlanCalendar } from '../../server/brew-plan';
import { occupancies, planningBusy } from '../../server/brew-plan/plan-busy';
import { createCatalogueEntries, sampleDesign } from '../../test/integration/helpers/catalogue-factory';
import { givePaidUpDues } from '../../test/integration/helpers/dues-factory';
import { createUser } from '../../test/integration/helpers/user-factory';
import { benchSignIn, bestOfEach, withBenchApp } from './bench-app';

const FERMENTERS = [30, 30, 30, 30, 60, 60];
const BATCHES = 200;
const BOOKINGS = 400;
const WEEKS = 52;
const ROUNDS = 7;
const DAY_MS = 86_400_000;

/** Fermenters, then batches and bookings spread over the year on them (overlaps allowed: the rows are the load, not a valid plan). */
async function seedPlan(db: Knex, userId: number, zone: string): Promise<void> {
  const items: number[] = [];
  for (const capacity of FERMENTERS) {
    const [id] = await db('kit_items').insert({ code: `BP${randomUUID().slice(0, 5)}`, name: 'Bench fermenter (invented)', kind: 'fermenter', capacity_litres: capacity, turnaround_hours: 24, state: 'in_service' });
    items.push(id);
  }
  const start = DateTime.now().setZone(zone).startOf('day').plus({ days: 1 });
  const span = WEEKS * 7;
  for (let i = 0; i < BATCHES; i++) {
    const brew = start.plus({ days: Math.floor((i * span) / BATCHES) });
    const [batchId] = await db('batches').insert({
      name: `Bench batch ${i}`, brewer_user_id: userId, created_by_user_id: userId, brew_date: new Date(`${brew.toISODate()}T00:00:00Z`),
      planned_volume_litres: 20, fermenter_kit_item_id: items[i % 4], recipe_id: null, recipe_version: null, notes: '',
    } as never);
    await db('batch_plans').insert({ batch_id: batchId, fermentation_days: 3 + (i % 3), conditioning_days: 0 });
  }
  const bookings = Array.from({ length: BOOKINGS }, (_, i) => {
    const startsAt = start.plus({ hours: Math.floor((i * span * 24) / BOOKINGS) + 8 });
    return {
      kit_item_id: i % 10 === 9 ? items[4 + (Math.floor(i / 10) % 2)] : items[i % 4], user_id: userId, created_by_user_id: userId, purpose: i % 10 === 0 ? ('maintenance' as const) : ('use' as const), batch_id: null, note: '',
      starts_at: startsAt.toJSDate(), ends_at: startsAt.plus({ hours: 30 }).toJSDate(), held_until: startsAt.plus({ hours: 54 }).toJSDate(), time_zone: zone,
    };
  });
  await db('bookings').insert(bookings);
}

export async function benchBrewPlan(root: string): Promise<void> {
  await withBenchApp(root, async ({ db, base, config }) => {
    const zone = config.coopTimeZone;
    const user = await createUser(db, ['member', 'brewer']);
    await givePaidUpDues(db, user.id);
    await seedPlan(db, user.id, zone);
    const headers = await benchSignIn(base, user.email, user.password);
    const recipeRes = await fetch(`${base}/api/recipes`, { method: 'POST', headers: { ...headers, 'content-type': 'application/json' }, body: JSON.stringify({ design: sampleDesign(await createCatalogueEntries(db)), visibility: 'private' }) });
    const recipe = (await recipeRes.json()) as { id: number; version: number };

    const now = Date.now();
    const wantedWeek = DateTime.now().setZone(zone).plus({ weeks: 20 }).toISODate()!;
    const from = new Date(now);
    const to = new Date(now + (WEEKS * 7 + 60) * DAY_MS);
    const schedule = { fermentationDays: 7, conditioningDays: 2 };
    let found = -1;
    const load = () => loadPlanCalendar(db, from, to);
    const compute = async () => {
      const calendar = await load();
      const busy = planningBusy(calendar, occupancies(calendar.batches, new Map(), zone, now), new Map());
      found = proposeSlots({ fermenters: calendar.fermenters, busy, volumeLitres: 40, schedule, wantedWeek, zone, notBefore: now, notAfter: now + BOOKING_LIMITS.maxDaysAhead * DAY_MS, searchDays: BREW_PLAN_LIMITS.searchWeeks * 7, limit: 6 }).length;
    };
    const api = async () => {
      const res = await fetch(`${base}/api/brew-plan/proposals`, { method: 'POST', headers: { ...headers, 'content-type': 'application/json' }, body: JSON.stringify({ recipeId: recipe.id, recipeVersion: recipe.version, volumeLitres: 40, wantedWeek, ...schedule }) });
      if (res.status !== 200) throw new Error(`proposals answered ${res.status}: ${await res.text()}`);
    };
    const loadOnly = async () => { await load(); };
    await loadOnly();
    await compute();
    await api();
    const [loaded, computed, viaApi] = await bestOfEach(ROUNDS, [loadOnly, compute, api]);
    const rows = await load();
    process.stdout.write(`\nBrew plan: ${FERMENTERS.length} fermenters × ${WEEKS} weeks, ${rows.batches.length} batches and ${rows.bookings.length} bookings loaded (best of ${ROUNDS})\n`);
    process.stdout.write(`${'loading the rows (baseline)'.padEnd(48)} ${loaded.toFixed(2).padStart(8)} ms   1.00 ×\n`);
    process.stdout.write(`${`loading + proposals (${found} slots)`.padEnd(48)} ${computed.toFixed(2).padStart(8)} ms   ${(computed / loaded).toFixed(2)} ×\n`);
    process.stdout.write(`${'POST /api/brew-plan/proposals'.padEnd(48)} ${viaApi.toFixed(2).padStart(8)} ms   ${(viaApi / loaded).toFixed(2)} ×\n`);
  });
}
