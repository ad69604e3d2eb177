import { Knex } from 'knex';
import { ACTIVE_STATUSES, BatchStatus } from '@shared/batches';
import { Booking } from '@shared/bookings';
import { BrewSchedule, DEFAULT_SCHEDULES, PlanFermenter } from '@shared/brew-plan';
import { dateOnly } from '../batches/batch-mapping';
import { BatchRecord, batchesRepository } from '../batches/batches.repository';
import { bookingsRepository } from '../bookings/bookings.repository';
import { kitRepository } from '../kit/kit.repository';
import { brewPlanRepository, LinkedBooking } from './brew-plan.repository';

/** A batch in (or planned for) a fermenter, with what the plan needs of it. */
export interface CalendarBatch {
  id: number;
  name: string;
  status: BatchStatus;
  brewDate: string;
  fermenterId: number;
  volumeLitres: number;
  fermentingAt: number | null;
  conditioningAt: number | null;
  /** The schedule it was planned with, else the ale defaults. */
  schedule: BrewSchedule;
  booking: LinkedBooking | null;
}

/** Everything that keeps the fermenters busy in a window: the rows the planner works from. */
export interface PlanCalendar {
  fermenters: PlanFermenter[];
  bookings: Booking[];
  batches: CalendarBatch[];
}

/** Loads the fermenters (not retired), the bookings held in [from, to) and the active batches in fermenters. */
export async function loadPlanCalendar(db: Knex, from: Date, to: Date): Promise<PlanCalendar> {
  const [items, bookings, records] = await Promise.all([
    kitRepository.list(db),
    bookingsRepository.listHeldBetween(db, from, to),
    batchesRepository.list(db, { statuses: ACTIVE_STATUSES }),
  ]);
  const fermenters = items
    .filter((i) => i.kind === 'fermenter' && i.state !== 'retired')
    .map((i): PlanFermenter => ({ id: i.id, code: i.code, name: i.name, capacityLitres: i.capacityLitres, inService: i.state === 'in_service', turnaroundHours: i.turnaroundHours }));
  return { fermenters, bookings, batches: await calendarBatches(db, records) };
}

/** The batches among `records` that sit in (or are planned for) a fermenter, with their schedules and bookings. */
export async function calendarBatches(db: Knex, records: readonly BatchRecord[]): Promise<CalendarBatch[]> {
  const inFermenters = records.filter((r) => r.fermenter_kit_item_id !== null);
  const ids = inFermenters.map((r) => r.id);
  const [schedules, linked] = await Promise.all([brewPlanRepository.schedulesOf(db, ids), brewPlanRepository.linkedBookings(db, ids)]);
  return inFermenters.map((r): CalendarBatch => ({
    id: r.id,
    name: r.name,
    status: r.status,
    brewDate: dateOnly(r.brew_date),
    fermenterId: r.fermenter_kit_item_id!,
    volumeLitres: Number(r.planned_volume_litres),
    fermentingAt: (r.measured?.pitched_at ?? r.fermenting_at)?.getTime() ?? null,
    conditioningAt: r.conditioning_at?.getTime() ?? null,
    schedule: schedules.get(r.id) ?? DEFAULT_SCHEDULES.ale,
    booking: linked.get(r.id) ?? null,
  }));
}
