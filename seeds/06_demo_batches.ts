import type { Knex } from 'knex';
import { recipesRepository } from '../server/recipes/recipes.repository';
import { correctedGravity } from '../shared/readings';
import { predictVersion } from '../server/recipes/version-prediction';

// The demo co-op's three batches (invented): a pale ale mid-fermentation, a strong dark ale whose
// fermentation has finished, and a mild still planned. Every gravity reading here is invented for
// the demo and says so in its note.
const HOUR = 3600_000;
const INVENTED = 'Demo reading (invented).';

interface DemoCurve { og: number; fg: number; midHours: number; widthHours: number }

/** An invented fermentation: gravity falling from OG to FG along a smooth S-curve. */
function demoGravity(curve: DemoCurve, hours: number): number {
  return curve.fg + (curve.og - curve.fg) / (1 + Math.exp((hours - curve.midHours) / curve.widthHours));
}

interface DemoBatch {
  recipe: string;
  brewer: string;
  fermenter: string;
  status: 'planned' | 'fermenting' | 'conditioning';
  /** Days from now to the brew day (negative: in the past). */
  brewDay: number;
  curve?: DemoCurve & { everyHours: number; instrument: 'logger' | 'hydrometer' };
}

const DEMO_BATCHES: DemoBatch[] = [
  { recipe: 'Fernhollow Pale', brewer: 'priya@fernhollow.example', fermenter: 'F1', status: 'fermenting', brewDay: -3,
    curve: { og: 1.05, fg: 1.012, midHours: 56, widthHours: 14, everyHours: 2, instrument: 'logger' } },
  { recipe: 'Lantern Strong Dark', brewer: 'tomas@fernhollow.example', fermenter: 'F5', status: 'conditioning', brewDay: -30,
    curve: { og: 1.085, fg: 1.017, midHours: 80, widthHours: 20, everyHours: 24, instrument: 'hydrometer' } },
  { recipe: 'Hearthside Mild', brewer: 'jonah@fernhollow.example', fermenter: 'F2', status: 'planned', brewDay: 5 },
];

function dayStart(daysFromNow: number): Date {
  const d = new Date(Date.now() + daysFromNow * 24 * HOUR);
  return new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate()));
}

function demoReadings(batchId: number, pitchedAt: Date, curve: NonNullable<DemoBatch['curve']>) {
  const rows = [];
  for (let h = 0; pitchedAt.getTime() + h * HOUR <= Date.now(); h += curve.everyHours) {
    // A small invented wobble so the logger's trace looks like a device's, rounded to what the instrument shows.
    const wobble = curve.instrument === 'logger' ? 0.0004 * Math.sin(h * 1.7) : 0;
    const step = curve.instrument === 'logger' ? 10000 : 1000;
    const raw = Math.round((demoGravity(curve, h) + wobble) * step) / step;
    const input = { instrument: curve.instrument, rawValue: raw, rawUnit: 'sg' as const, sampleTemperatureC: 19, calibrationTemperatureC: curve.instrument === 'hydrometer' ? 20 : null };
    const corrected = correctedGravity(input, { wortCorrectionFactor: 1.04, originalBrix: null });
    rows.push({
      batch_id: batchId, measured_at: new Date(pitchedAt.getTime() + h * HOUR), instrument: input.instrument, raw_value: raw, raw_unit: 'sg' as const,
      sample_temperature_c: 19, calibration_temperature_c: corrected.calibrationTemperatureC, corrected_sg: corrected.correctedSg.toFixed(5),
      source: curve.instrument === 'logger' ? ('file' as const) : ('hand' as const), note: INVENTED,
    });
  }
  return rows;
}

/** Adds the demo batches once, when the co-op has none and its demo people, recipes and kit exist. */
export async function seed(knex: Knex): Promise<void> {
  const existing = await knex('batches').count<{ count: number }[]>({ count: '*' });
  if (Number(existing[0].count) > 0) return;
  for (const demo of DEMO_BATCHES) {
    const brewer = await knex('users').where({ email: demo.brewer }).first('id');
    const recipe = await knex('recipes').where({ name: demo.recipe }).first('id', 'current_version');
    const fermenter = await knex('kit_items').where({ code: demo.fermenter }).first('id');
    if (!brewer || !recipe || !fermenter) continue;
    const version = (await recipesRepository.findVersion(knex, recipe.id, recipe.current_version))!;
    const design = version.design;
    const predicted = predictVersion(version);
    const brewDate = dayStart(demo.brewDay);
    const pitchedAt = new Date(brewDate.getTime() + 17 * HOUR);
    const dates = demo.status === 'planned' ? {} : { brewing_at: new Date(brewDate.getTime() + 9 * HOUR), fermenting_at: pitchedAt };
    const [batchId] = (await knex('batches').insert({
      name: design.name, brewer_user_id: brewer.id, created_by_user_id: brewer.id, recipe_id: recipe.id, recipe_version: recipe.current_version,
      predicted: JSON.stringify(predicted), brew_date: brewDate, planned_volume_litres: design.batchVolumeLitres, fermenter_kit_item_id: fermenter.id,
      status: demo.status, planned_at: new Date(brewDate.getTime() - 7 * 24 * HOUR), ...dates,
      ...(demo.status === 'conditioning' ? { conditioning_at: new Date(pitchedAt.getTime() + 14 * 24 * HOUR) } : {}),
      notes: 'Demo batch (invented).',
    })) as unknown as number[];
    if (!demo.curve) continue;
    await knex('brew_day_measurements').insert({
      batch_id: batchId, pre_boil_litres: design.batchVolumeLitres + 4.5, pre_boil_gravity: Number((1 + (demo.curve.og - 1) * 0.87).toFixed(3)),
      fermenter_litres: design.batchVolumeLitres, original_gravity: demo.curve.og, original_gravity_temperature_c: 20, pitched_at: pitchedAt, updated_by_user_id: brewer.id,
    });
    const rows = demoReadings(batchId, pitchedAt, demo.curve);
    for (let i = 0; i < rows.length; i += 500) await knex('gravity_readings').insert(rows.slice(i, i + 500));
  }
}
