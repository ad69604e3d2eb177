import { Knex } from 'knex';

/** Leases on scheduled jobs, one row per job: taking one is a single atomic UPDATE, so it holds across processes. */
export const jobLeaseRepository = {
  /** Takes the lease when it is free or expired (or already ours); true when this holder now has it. */
  async tryAcquire(db: Knex, name: string, holder: string, now: Date, until: Date): Promise<boolean> {
    await db('job_leases').insert({ name, holder: null, lease_until: new Date(0), last_run_at: null }).onConflict('name').ignore();
    const changed = await db('job_leases')
      .where({ name })
      .where((free) => free.where('lease_until', '<', now).orWhere('holder', holder))
      .update({ holder, lease_until: until });
    return changed === 1;
  },

  /** Gives the lease back and notes the run. */
  async release(db: Knex, name: string, holder: string, now: Date): Promise<void> {
    await db('job_leases').where({ name, holder }).update({ holder: null, lease_until: now, last_run_at: now });
  },
};
