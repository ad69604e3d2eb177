import { Cron } from 'croner';
import { Knex } from 'knex';
import { hostname } from 'node:os';
import { randomUUID } from 'node:crypto';
import { Logger } from 'pino';
import { jobLeaseRepository } from './job-lease.repository';

/** A job the server runs on its own, every `everySeconds`. */
export interface ScheduledJob {
  name: string;
  everySeconds: number;
  /** True: only one process runs it at a time (a lease row); false: the job claims its own rows. */
  exclusive: boolean;
  run(): Promise<unknown>;
}

/** Names this process in leases and claims. */
export function processHolderId(): string {
  return `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`;
}

const LEASE_MS = 10 * 60 * 1000;

async function runOnce(db: Knex, job: ScheduledJob, holder: string): Promise<void> {
  if (!job.exclusive) {
    await job.run();
    return;
  }
  const now = new Date();
  if (!(await jobLeaseRepository.tryAcquire(db, job.name, holder, now, new Date(now.getTime() + LEASE_MS)))) return;
  try {
    await job.run();
  } finally {
    await jobLeaseRepository.release(db, job.name, holder, new Date());
  }
}

/** Starts the jobs (croner, one run at a time per job); a failing run is logged and the next one goes ahead. */
export function startScheduler(deps: { db: Knex; holder: string; jobs: ScheduledJob[]; logger: Logger }): { stop(): void } {
  const crons = deps.jobs.map(
    (job) =>
      new Cron('* * * * * *', { name: job.name, interval: job.everySeconds, protect: true }, async () => {
        try {
          await runOnce(deps.db, job, deps.holder);
        } catch (error) {
          deps.logger.warn({ job: job.name, err: error }, 'scheduled job failed; it runs again at its next time');
        }
      }),
  );
  return { stop: () => crons.forEach((cron) => cron.stop()) };
}
