import { Knex } from 'knex';
import { StyleTarget, StyleTargetInput } from '@shared/recipes';

const TARGETS = ['og', 'fg', 'abv', 'ibu', 'colourSrm'] as const;
const COLUMN: Record<(typeof TARGETS)[number], string> = { og: 'og', fg: 'fg', abv: 'abv', ibu: 'ibu', colourSrm: 'colour_srm' };

function toStyle(row: Record<string, unknown>): StyleTarget {
  const style = { id: row.id as number, name: row.name as string } as StyleTarget;
  for (const t of TARGETS) style[t] = { min: row[`${COLUMN[t]}_min`] as number, max: row[`${COLUMN[t]}_max`] as number };
  return style;
}

function toRow(input: StyleTargetInput): Record<string, unknown> {
  const row: Record<string, unknown> = { name: input.name };
  for (const t of TARGETS) Object.assign(row, { [`${COLUMN[t]}_min`]: input[t].min, [`${COLUMN[t]}_max`]: input[t].max });
  return row;
}

/** Data access for the co-op's style list (one min/max column pair per target). */
export const stylesRepository = {
  async list(db: Knex): Promise<StyleTarget[]> {
    return (await db('style_targets').orderBy('name')).map(toStyle);
  },

  async findById(db: Knex, id: number): Promise<StyleTarget | null> {
    const row = await db('style_targets').where({ id }).first();
    return row ? toStyle(row) : null;
  },

  /** The style whose name the database holds equal to `name` (case and accents ignored). */
  async findByName(db: Knex, name: string): Promise<StyleTarget | null> {
    const row = await db('style_targets').where({ name }).first();
    return row ? toStyle(row) : null;
  },

  async insert(db: Knex, input: StyleTargetInput): Promise<number> {
    const [id] = await db('style_targets').insert(toRow(input));
    return id;
  },

  async update(db: Knex, id: number, input: StyleTargetInput): Promise<void> {
    await db('style_targets').where({ id }).update({ ...toRow(input), updated_at: new Date() });
  },
};
