import { Knex } from 'knex';
import { BrewhouseSettings, DEFAULT_BREWHOUSE_SETTINGS } from '@shared/recipes';
import { readJsonColumn } from '../db-json';
import { storedBrewhouseSchema } from '../recipes/version-columns';

// Settings saved before a field existed lack it; the default fills it in.
const storedSettingsSchema = storedBrewhouseSchema.partial();

/** Data access for the single row of brewhouse settings. */
export const brewhouseRepository = {
  /** The co-op's settings, or the defaults until someone saves them. */
  async load(db: Knex): Promise<BrewhouseSettings> {
    const row = await db('brewhouse_settings').where({ id: 1 }).first();
    if (!row) return DEFAULT_BREWHOUSE_SETTINGS;
    return { ...DEFAULT_BREWHOUSE_SETTINGS, ...readJsonColumn(row.settings, storedSettingsSchema, 'brewhouse_settings.settings') };
  },

  async save(db: Knex, settings: BrewhouseSettings, userId: number): Promise<void> {
    await db('brewhouse_settings')
      .insert({ id: 1, settings: JSON.stringify(settings), updated_by_user_id: userId, updated_at: new Date() })
      .onConflict('id')
      .merge();
  },
};
