import { randomUUID } from 'node:crypto';
import { Knex } from 'knex';
import { DateTime } from 'luxon';
import { KitState } from '@shared/kit';

/** Inserts a fermenter with a unique code, so each test owns its item and its bookings. */
export async function createKitItem(db: Knex, overrides: { turnaroundHours?: number; state?: KitState } = {}): Promise<{ id: number; code: string }> {
  const code = `T${randomUUID().slice(0, 8)}`;
  const [id] = await db('kit_items').insert({
    code,
    name: `Test fermenter ${code}`,
    kind: 'fermenter',
    capacity_litres: 30,
    turnaround_hours: overrides.turnaroundHours ?? 24,
    state: overrides.state ?? 'in_service',
  });
  return { id, code };
}

/** A wall-clock time `days` from today at `hour`:`minute` in `zone`, as the booking form sends it. */
export function wallClockFromToday(zone: string, days: number, hour: number, minute = 0): string {
  return DateTime.now().setZone(zone).plus({ days }).set({ hour, minute, second: 0, millisecond: 0 }).toFormat("yyyy-MM-dd'T'HH:mm");
}
