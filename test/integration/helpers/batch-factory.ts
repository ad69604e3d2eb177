import { randomUUID } from 'node:crypto';
import { Knex } from 'knex';
import { ApiClient } from './api-client';

/** A fermenter of the kit register with a unique code, so each test owns its kit. */
export async function createFermenter(db: Knex, state: 'in_service' | 'maintenance' = 'in_service'): Promise<number> {
  const [id] = await db('kit_items').insert({ code: `T${randomUUID().slice(0, 8)}`, name: 'Test fermenter', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 24, state });
  return id;
}

/** Starts a batch without a recipe through the API and returns its body. */
export async function startBatch(client: ApiClient, overrides: Record<string, unknown> = {}) {
  const res = await client.send('post', '/api/batches', {
    name: 'Test batch', recipeId: null, recipeVersion: null, brewDate: '2026-11-20', plannedVolumeLitres: 20, fermenterId: null, ...overrides,
  });
  if (res.status !== 201) throw new Error(`starting a batch failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body;
}

/** A reading body with sensible defaults. */
export function readingBody(overrides: Record<string, unknown> = {}) {
  return { measuredAt: '2026-11-21T08:00:00Z', instrument: 'hydrometer', rawValue: 1.05, rawUnit: 'sg', sampleTemperatureC: 20, calibrationTemperatureC: 20, ...overrides };
}
