import { Knex } from 'knex';

/** Whether the database answers a trivial query right now. */
export async function databaseReachable(db: Knex): Promise<boolean> {
  return db
    .raw('SELECT 1')
    .then(() => true)
    .catch(() => false);
}
