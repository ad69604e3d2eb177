import type { Knex } from 'knex';
import { DateTime } from 'luxon';
import { BrewSchedule, heldEnd, placeSchedule } from '../shared/brew-plan';
import { coopTimeZoneFrom } from '../server/config';
import { recipesRepository } from '../server/recipes/recipes.repository';
import { predictVersion } from '../server/recipes/version-prediction';

// The demo co-op's brew plan (invented): the planned mild gets its schedule and fermenter booking,
// two more batches are planned in the coming weeks, the fermenting pale's brewer booked F1 for four
// weeks (so the gravity forecast shows it freeing up early), and F4 has a maintenance block.
const ZONE = coopTimeZoneFrom();
const TURNAROUND_HOURS = 24;

interface PlannedDemo { recipe: string; brewer: string; fermenter: string; weeksAhead: number; schedule: BrewSchedule }

const MORE_PLANNED: PlannedDemo[] = [
  { recipe: 'Fernhollow Pale', brewer: 'tomas@fernhollow.example', fermenter: 'F3', weeksAhead: 2, schedule: { fermentationDays: 14, conditioningDays: 7 } },
  { recipe: 'Lantern Strong Dark', brewer: 'priya@fernhollow.example', fermenter: 'F6', weeksAhead: 4, schedule: { fermentationDays: 18, conditioningDays: 21 } },
];

const monday = (weeksAhead: number) => DateTime.now().setZone(ZONE).startOf('week').plus({ weeks: weeksAhead }).toISODate()!;

async function book(knex: Knex, row: { kitItemId: number; userId: number; start: number; end: number; heldUntil: number; batchId: number | null; purpose: 'use' | 'maintenance'; note: string }) {
  await knex('bookings').insert({
    kit_item_id: row.kitItemId, user_id: row.userId, created_by_user_id: row.userId, purpose: row.purpose, starts_at: new Date(row.start), ends_at: new Date(row.end),
    held_until: new Date(row.heldUntil), time_zone: ZONE, batch_id: row.batchId, note: row.note,
  });
}

/** Books the schedule of a planned batch on its fermenter and keeps the schedule. */
async function planBatch(knex: Knex, batch: { id: number; name: string; brewDate: string; kitItemId: number; userId: number }, schedule: BrewSchedule) {
  const placed = placeSchedule(batch.brewDate, schedule, ZONE);
  await knex('batch_plans').insert({ batch_id: batch.id, fermentation_days: schedule.fermentationDays, conditioning_days: schedule.conditioningDays });
  await book(knex, { kitItemId: batch.kitItemId, userId: batch.userId, start: placed.start, end: placed.end, heldUntil: heldEnd(placed, TURNAROUND_HOURS), batchId: batch.id, purpose: 'use', note: `Brew plan: ${batch.name}` });
}

async function addPlanned(knex: Knex, demo: PlannedDemo): Promise<void> {
  const brewer = await knex('users').where({ email: demo.brewer }).first('id');
  const recipe = await knex('recipes').where({ name: demo.recipe }).first('id', 'current_version');
  const fermenter = await knex('kit_items').where({ code: demo.fermenter }).first('id');
  if (!brewer || !recipe || !fermenter) return;
  const version = (await recipesRepository.findVersion(knex, recipe.id, recipe.current_version))!;
  const brewDate = monday(demo.weeksAhead);
  const name = `${version.design.name} (planned)`;
  const [id] = (await knex('batches').insert({
    name, brewer_user_id: brewer.id, created_by_user_id: brewer.id, recipe_id: recipe.id, recipe_version: recipe.current_version,
    predicted: JSON.stringify(predictVersion(version)), brew_date: new Date(`${brewDate}T00:00:00Z`), planned_volume_litres: version.design.batchVolumeLitres,
    fermenter_kit_item_id: fermenter.id, notes: 'Demo batch (invented).',
  })) as unknown as number[];
  await planBatch(knex, { id, name, brewDate, kitItemId: fermenter.id, userId: brewer.id }, demo.schedule);
}

/** Adds the demo plan once, when no batch has a plan yet and the demo batches exist. */
export async function seed(knex: Knex): Promise<void> {
  const existing = await knex('batch_plans').count<{ count: number }[]>({ count: '*' });
  if (Number(existing[0].count) > 0) return;
  const demoBatches = await knex('batches').where({ notes: 'Demo batch (invented).' }).select('id', 'name', 'status', 'brew_date', 'fermenter_kit_item_id', 'brewer_user_id');
  const mild = demoBatches.find((b) => b.status === 'planned');
  const pale = demoBatches.find((b) => b.status === 'fermenting');
  if (!mild || !pale || mild.fermenter_kit_item_id === null || pale.fermenter_kit_item_id === null) return;
  const mildDate = DateTime.fromJSDate(mild.brew_date, { zone: 'utc' }).toISODate()!;
  await planBatch(knex, { id: mild.id, name: mild.name, brewDate: mildDate, kitItemId: mild.fermenter_kit_item_id, userId: mild.brewer_user_id }, { fermentationDays: 14, conditioningDays: 7 });
  const paleStart = DateTime.fromJSDate(pale.brew_date, { zone: 'utc' }).toISODate()!;
  const paleBooked = placeSchedule(paleStart, { fermentationDays: 18, conditioningDays: 8 }, ZONE);
  await book(knex, { kitItemId: pale.fermenter_kit_item_id, userId: pale.brewer_user_id, start: paleBooked.start, end: paleBooked.end, heldUntil: heldEnd(paleBooked, TURNAROUND_HOURS), batchId: pale.id, purpose: 'use', note: 'Pale ale, four weeks to be safe' });
  for (const demo of MORE_PLANNED) await addPlanned(knex, demo);
  const f4 = await knex('kit_items').where({ code: 'F4' }).first('id');
  const admin = await knex('users').where({ email: 'ada@fernhollow.example' }).first('id');
  if (f4 && admin) {
    const start = DateTime.fromISO(monday(1), { zone: ZONE }).plus({ days: 2, hours: 9 });
    await book(knex, { kitItemId: f4.id, userId: admin.id, start: start.toMillis(), end: start.plus({ days: 2 }).toMillis(), heldUntil: start.plus({ days: 2 }).toMillis(), batchId: null, purpose: 'maintenance', note: 'Valve seals replaced (demo)' });
  }
}
