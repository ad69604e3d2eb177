import type { Knex } from 'knex';

// The demo co-op's own style list: invented ranges for the demo, edited by its brewers.
export const STYLES = [
  { name: 'Pale ale', og: [1.045, 1.06], fg: [1.01, 1.015], abv: [4.5, 6.2], ibu: [30, 50], colour_srm: [5, 10] },
  { name: 'Strong dark ale', og: [1.075, 1.11], fg: [1.012, 1.024], abv: [8, 11], ibu: [20, 45], colour_srm: [18, 35] },
  { name: 'Mild', og: [1.03, 1.038], fg: [1.008, 1.013], abv: [3, 4.2], ibu: [10, 25], colour_srm: [12, 25] },
  { name: 'Wheat beer', og: [1.044, 1.052], fg: [1.008, 1.014], abv: [4.3, 5.6], ibu: [8, 15], colour_srm: [2, 6] },
];

export async function seed(knex: Knex): Promise<void> {
  const rows = STYLES.map(({ name, ...targets }) => {
    const row: Record<string, unknown> = { name };
    for (const [key, [min, max]] of Object.entries(targets)) Object.assign(row, { [`${key}_min`]: min, [`${key}_max`]: max });
    return row;
  });
  await knex('style_targets').insert(rows).onConflict('name').ignore();
}
