import { randomUUID } from 'node:crypto';
import { Knex } from 'knex';
import { DateTime } from 'luxon';
import { ApiClient } from './api-client';
import { createCatalogueEntries, sampleDesign } from './catalogue-factory';

/** A fermenter with a unique code and the given capacity, so each test owns its lane. */
export async function createSizedFermenter(db: Knex, capacityLitres: number, turnaroundHours = 24): Promise<{ id: number; code: string }> {
  const code = `P${randomUUID().slice(0, 8)}`;
  const [id] = await db('kit_items').insert({ code, name: `Plan fermenter ${code}`, kind: 'fermenter', capacity_litres: capacityLitres, turnaround_hours: turnaroundHours, state: 'in_service' });
  return { id, code };
}

/** A recipe of the caller's with an ale yeast (16–22 °C), saved once: version 1. */
export async function createAleRecipe(db: Knex, client: ApiClient): Promise<{ id: number; version: number }> {
  const ids = await createCatalogueEntries(db);
  const res = await client.send('post', '/api/recipes', { design: sampleDesign(ids, `Plan pale ${ids.tag}`), visibility: 'private' });
  if (res.status !== 201) throw new Error(`creating a recipe failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { id: res.body.id, version: res.body.version };
}

/** Monday `weeks` weeks from now in `zone`, yyyy-MM-dd. */
export function mondayInWeeks(zone: string, weeks: number): string {
  return DateTime.now().setZone(zone).plus({ weeks }).startOf('week').toISODate()!;
}
