import type { Knex } from 'knex';

/** The demo co-op's kit room (invented, as the brief describes it); added once when the register is empty. */
export const DEMO_KIT = [
  { code: 'F1', name: 'Conical fermenter 1', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 24 },
  { code: 'F2', name: 'Conical fermenter 2', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 24 },
  { code: 'F3', name: 'Conical fermenter 3', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 24 },
  { code: 'F4', name: 'Conical fermenter 4', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 24 },
  { code: 'F5', name: 'Large fermenter 5', kind: 'fermenter', capacity_litres: 60, turnaround_hours: 24 },
  { code: 'F6', name: 'Large fermenter 6', kind: 'fermenter', capacity_litres: 60, turnaround_hours: 24 },
  { code: 'K1', name: 'Electric kettle', kind: 'kettle', capacity_litres: 50, turnaround_hours: 4 },
  { code: 'C1', name: 'Plate chiller', kind: 'chiller', capacity_litres: null, turnaround_hours: 2 },
  { code: 'KG1', name: 'Kegging set', kind: 'kegging', capacity_litres: null, turnaround_hours: 4 },
] as const;

export async function seed(knex: Knex): Promise<void> {
  const existing = await knex('kit_items').count<{ count: number }[]>({ count: '*' });
  if (Number(existing[0].count) > 0) return;
  await knex('kit_items').insert(DEMO_KIT.map((item) => ({ ...item })));
}
