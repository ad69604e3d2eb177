// Kit room bookings through the API against bare queries of the same rows, in the same run: the
// room calendar of a month (6 fermenters, 400 bookings on record) and making bookings one after the
// other (session, CSRF, dues check, row lock, overlap check, audit and confirmation e-mail).
import { randomUUID } from 'node:crypto';
import { Knex } from 'knex';
import { DateTime } from 'luxon';
import { givePaidUpDues } from '../../test/integration/helpers/dues-factory';
import { createUser } from '../../test/integration/helpers/user-factory';
import { benchSignIn, bestOf, withBenchApp } from './bench-app';

const FERMENTERS = 6;
const BOOKINGS = 400;
const CREATES_PER_ROUND = 20;
const ROUNDS = 7;

async function addItem(db: Knex, turnaroundHours: number): Promise<number> {
  const [id] = await db('kit_items').insert({ code: `B${randomUUID().slice(0, 6)}`, name: 'Bench fermenter (invented)', kind: 'fermenter', capacity_litres: 30, turnaround_hours: turnaroundHours, state: 'in_service' });
  return id;
}

/** 400 bookings of two days each over the next 130 days, spread over the fermenters. */
async function seedBookings(db: Knex, userId: number, zone: string): Promise<void> {
  const items: number[] = [];
  for (let i = 0; i < FERMENTERS; i++) items.push(await addItem(db, 24));
  const start = DateTime.now().startOf('day').plus({ days: 1 });
  const rows = Array.from({ length: BOOKINGS }, (_, i) => {
    const startsAt = start.plus({ days: 2 * Math.floor(i / FERMENTERS) }).plus({ hours: 8 });
    return {
      kit_item_id: items[i % FERMENTERS], user_id: userId, created_by_user_id: userId, purpose: 'use' as const, batch_id: null, note: '',
      starts_at: startsAt.toJSDate(), ends_at: startsAt.plus({ hours: 20 }).toJSDate(), held_until: startsAt.plus({ hours: 44 }).toJSDate(), time_zone: zone,
    };
  });
  await db('bookings').insert(rows);
}

function report(name: string, api: number, bare: number): void {
  process.stdout.write(`${name.padEnd(44)} bare ${bare.toFixed(2).padStart(7)} ms · API ${api.toFixed(2).padStart(7)} ms · ratio ${(api / bare).toFixed(2)} ×\n`);
}

export async function benchBookingsApi(root: string): Promise<void> {
  await withBenchApp(root, async ({ db, base, config }) => {
    const zone = config.coopTimeZone;
    const user = await createUser(db, ['member']);
    await givePaidUpDues(db, user.id);
    await seedBookings(db, user.id, zone);
    const headers = await benchSignIn(base, user.email, user.password);

    const from = DateTime.now().setZone(zone).plus({ days: 1 });
    const to = from.plus({ days: 30 });
    const range = { from: from.startOf('day').toJSDate(), to: to.plus({ days: 1 }).startOf('day').toJSDate() };
    const calendarUrl = `${base}/api/bookings?from=${from.toISODate()}&to=${to.toISODate()}`;
    let expected = -1;
    const calendarApi = async () => {
      const res = await fetch(calendarUrl, { headers });
      const count = ((await res.json()) as unknown[]).length;
      if (!res.ok || count !== expected) throw new Error(`the calendar answered ${res.status} with ${count} bookings, the bare query found ${expected}`);
    };
    const calendarBare = async () => {
      const rows = await db('bookings')
        .join('kit_items', 'kit_items.id', 'bookings.kit_item_id')
        .join('users', 'users.id', 'bookings.user_id')
        .whereNull('bookings.cancelled_at').where('bookings.starts_at', '<', range.to).where('bookings.held_until', '>', range.from)
        .orderBy('bookings.starts_at')
        .select('bookings.*', 'kit_items.code as kit_item_code', 'kit_items.name as kit_item_name', 'users.name as user_name');
      expected = rows.length;
    };

    const apiItem = await addItem(db, 0);
    const bareItem = await addItem(db, 0);
    const firstSlot = DateTime.now().setZone(zone).startOf('day').plus({ days: 200, hours: 6 });
    let apiSlot = 0;
    let bareSlot = 0;
    const createApi = async () => {
      for (let i = 0; i < CREATES_PER_ROUND; i++) {
        const starts = firstSlot.plus({ hours: apiSlot++ });
        const body = JSON.stringify({ kitItemId: apiItem, start: starts.toFormat("yyyy-MM-dd'T'HH:mm"), end: starts.plus({ minutes: 30 }).toFormat("yyyy-MM-dd'T'HH:mm") });
        const res = await fetch(`${base}/api/bookings`, { method: 'POST', headers: { ...headers, 'content-type': 'application/json' }, body });
        if (res.status !== 201) throw new Error(`booking failed: ${res.status} ${await res.text()}`);
      }
    };
    const createBare = async () => {
      for (let i = 0; i < CREATES_PER_ROUND; i++) {
        const starts = firstSlot.plus({ hours: bareSlot++ });
        await db.transaction((trx) => trx('bookings').insert({
          kit_item_id: bareItem, user_id: user.id, created_by_user_id: user.id, purpose: 'use', batch_id: null, note: '',
          starts_at: starts.toJSDate(), ends_at: starts.plus({ minutes: 30 }).toJSDate(), held_until: starts.plus({ minutes: 30 }).toJSDate(), time_zone: zone,
        }));
      }
    };

    await calendarBare();
    await calendarApi();
    const calendar = { bare: await bestOf(ROUNDS, calendarBare), api: await bestOf(ROUNDS, calendarApi) };
    const creates = { bare: await bestOf(ROUNDS, createBare), api: await bestOf(ROUNDS, createApi) };
    process.stdout.write(`\nKit room bookings: ${FERMENTERS} fermenters, ${BOOKINGS} bookings on record (best of ${ROUNDS})\n`);
    report(`room calendar, 31 days (${expected} bookings)`, calendar.api, calendar.bare);
    report(`${CREATES_PER_ROUND} bookings made one after the other`, creates.api / CREATES_PER_ROUND, creates.bare / CREATES_PER_ROUND);
    process.stdout.write('(the second line per booking; the bare baseline inserts the row alone in its own transaction)\n');
  });
}
