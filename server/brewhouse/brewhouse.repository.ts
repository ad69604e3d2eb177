import { Knex } from 'knex';
import { BrewhouseSettings, DEFAULT_BREWHOUSE_SETTINGS } from '@shared/recipes';

/** Data access for the single row of brewhouse settings. */
export const brewhouseRepository = {
  /** The co-op's settings, or the defaults until someone saves them. */
  async load(db: Knex): Promise<BrewhouseSettings> {
    const row = await db('brewhouse_settings').where({ id: 1 }).first();
    return row ? { ...DEFAULT_BREWHOUSE_SETTINGS, ...(row.settings as BrewhouseSettings) } : DEFAULT_BREWHOUSE_SETTINGS;
  },

  async save(db: Knex, settings: BrewhouseSettings, userId: number): Promise<void> {
    await db('brewhouse_settings')
      .insert({ id: 1, settings: JSON.stringify(settings), updated_by_user_id: userId, updated_at: new Date() })
      .onConflict('id')
      .merge();
  },
};
