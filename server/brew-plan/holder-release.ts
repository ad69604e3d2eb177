import { Knex } from 'knex';
import { expectedRelease } from '@shared/brew-plan';
import { KitItem } from '@shared/kit';
import { batchesRepository } from '../batches/batches.repository';
import { fermentationChart } from '../fermentation/fermentation.routes';
import { occupyingBatch } from './plan-busy';
import { calendarBatches } from './plan-calendar';

/**
 * When the batch holding `item` is expected to hand it back, cleaning included (ms): the plan's
 * rule (`expectedRelease`), read from the batch and its gravity log; null when only packaging tells.
 */
export async function holderRelease(db: Knex, item: KitItem, holderId: number, zone: string, now: number): Promise<number | null> {
  const record = await batchesRepository.findById(db, holderId);
  if (!record || record.status !== 'fermenting') return null;
  const [batch] = await calendarBatches(db, [record]);
  const { forecast } = await fermentationChart(db, holderId);
  if (!batch || forecast.status !== 'forecast') return null;
  return expectedRelease(occupyingBatch(batch, new Map([[holderId, forecast.finishTime]])), item.turnaroundHours, zone, now);
}
