import { DuesRenewalsService } from '../dues';
import { BookingNotices } from '../bookings';
import { OutboxDispatcher } from '../mail';
import { ScheduledJob } from './scheduler';

/** The work the server does on its own, also callable directly (tests do). */
export interface AppJobs {
  outbox: OutboxDispatcher;
  dues: DuesRenewalsService;
  bookingReminders: BookingNotices;
}

/** How often each job runs, and which must run in one process at a time. */
export function appJobSchedule(jobs: AppJobs, mailDispatchSeconds: number): ScheduledJob[] {
  return [
    { name: 'outbox', everySeconds: mailDispatchSeconds, exclusive: false, run: () => jobs.outbox.dispatchDue() },
    { name: 'dues-renewals', everySeconds: 3600, exclusive: true, run: () => jobs.dues.runRenewals() },
    { name: 'dues-overdue-reminders', everySeconds: 3600, exclusive: true, run: () => jobs.dues.sendOverdueReminders() },
    { name: 'booking-reminders', everySeconds: 3600, exclusive: true, run: () => jobs.bookingReminders.remindTomorrow() },
  ];
}
