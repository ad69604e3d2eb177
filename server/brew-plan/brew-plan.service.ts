import { Knex } from 'knex';
import { DateTime } from 'luxon';
import { SessionUser } from '@shared/auth';
import { BOOKING_LIMITS, instantToWallClock } from '@shared/bookings';
import { FERMENTER_HOLDING_STATUSES } from '@shared/batches';
import { BREW_PLAN_LIMITS, leftOutFermenters, BrewPlanTimeline, ProposalRequest, proposeSlots, scheduleTotalDays, SlotProposal, SlotProposals } from '@shared/brew-plan';
import { fermentationChart } from '../fermentation/fermentation.routes';
import { RecipesService } from '../recipes';
import { CalendarBatch, loadPlanCalendar } from './plan-calendar';
import { expectedReleases, occupancies, planningBusy, timelineBusy } from './plan-busy';
import { planBrewers } from './plan-brewer';
import { assertScheduleFits, scheduleFor } from './plan-schedule';
import { timelineLanes } from './timeline-lanes';

const DAY_MS = 86_400_000;
const iso = (ms: number) => new Date(ms).toISOString();

/** When the gravity log forecasts each fermenting batch to finish (ms), where it can. */
async function forecastFinishes(db: Knex, batches: readonly CalendarBatch[]): Promise<Map<number, number>> {
  const finishes = new Map<number, number>();
  for (const batch of batches.filter((b) => b.status === 'fermenting')) {
    const { forecast } = await fermentationChart(db, batch.id);
    if (forecast.status === 'forecast') finishes.set(batch.id, forecast.finishTime);
  }
  return finishes;
}

/** The brew plan's reads: the timeline over the coming weeks and the slots proposed for a batch. */
export function createBrewPlanReads(db: Knex, coopTimeZone: string, recipes: RecipesService, now: () => Date = () => new Date()) {
  return {
    async timeline(from: string | undefined, weeks: number): Promise<BrewPlanTimeline> {
      const start = (from ? DateTime.fromISO(from, { zone: coopTimeZone }) : DateTime.fromJSDate(now()).setZone(coopTimeZone).startOf('week')).startOf('day');
      const end = start.plus({ weeks });
      const calendar = await loadPlanCalendar(db, start.toJSDate(), end.toJSDate());
      const forecasts = await forecastFinishes(db, calendar.batches);
      const occupancy = occupancies(calendar.batches, forecasts, coopTimeZone, now().getTime());
      const { lanes, room } = timelineLanes(calendar, occupancy, forecasts, timelineBusy(calendar, occupancy), start.toMillis(), end.toMillis());
      return { from: start.toISODate()!, to: end.minus({ days: 1 }).toISODate()!, timeZone: coopTimeZone, lanes, room };
    },

    /** Whom an admin may plan a batch for. */
    brewers: () => planBrewers(db),

    async proposals(user: SessionUser, request: ProposalRequest): Promise<SlotProposals> {
      const version = await recipes.version(user, request.recipeId, request.recipeVersion);
      const { schedule, basis } = scheduleFor(version, request);
      assertScheduleFits(schedule);
      const monday = DateTime.fromISO(request.wantedWeek, { zone: coopTimeZone }).startOf('week');
      const searchDays = BREW_PLAN_LIMITS.searchWeeks * 7;
      const nowMs = now().getTime();
      const windowEnd = monday.plus({ days: searchDays + scheduleTotalDays(schedule) + 8 }).toJSDate();
      const calendar = await loadPlanCalendar(db, new Date(Math.min(nowMs, monday.toMillis())), windowEnd);
      const forecasts = await forecastFinishes(db, calendar.batches);
      const releases = expectedReleases(calendar, forecasts, coopTimeZone, nowMs);
      const busy = planningBusy(calendar, occupancies(calendar.batches, forecasts, coopTimeZone, nowMs), releases);
      const slots = proposeSlots({
        fermenters: calendar.fermenters, busy, volumeLitres: request.volumeLitres, schedule, wantedWeek: request.wantedWeek, zone: coopTimeZone,
        notBefore: nowMs, notAfter: nowMs + BOOKING_LIMITS.maxDaysAhead * DAY_MS, searchDays, limit: calendar.fermenters.length,
      });
      const proposals = slots.map((s): SlotProposal => ({
        kitItemId: s.fermenter.id, kitItemCode: s.fermenter.code, kitItemName: s.fermenter.name, capacityLitres: s.fermenter.capacityLitres!,
        brewDate: s.placed.brewDate, startLocal: instantToWallClock(new Date(s.placed.start), coopTimeZone), endLocal: instantToWallClock(new Date(s.placed.end), coopTimeZone),
        heldUntil: iso(s.heldUntil), phases: s.placed.phases.map((p) => ({ phase: p.phase, start: iso(p.start), end: iso(p.end) })),
      }));
      const holds = calendar.batches
        .filter((b) => FERMENTER_HOLDING_STATUSES.includes(b.status))
        .map((b) => ({ kitItemId: b.fermenterId, batchId: b.id, batchName: b.name, until: releases.get(b.id) ?? null }));
      const leftOut = leftOutFermenters(calendar.fermenters, slots, holds, request.volumeLitres, coopTimeZone);
      return { recipeName: version.design.name, schedule, basis, weekStart: monday.toISODate()!, proposals, leftOut };
    },
  };
}

export type BrewPlanReads = ReturnType<typeof createBrewPlanReads>;
