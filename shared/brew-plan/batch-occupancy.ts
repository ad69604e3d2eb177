import { BatchStatus } from '../batches/batch-status';
import { BrewSchedule } from './brew-schedule';
import { PlacedPhase, placeSchedule } from './slot-placement';

const DAY_MS = 86_400_000;

/** What is known of a batch that sits in a fermenter. */
export interface OccupyingBatch {
  status: BatchStatus;
  brewDate: string;
  schedule: BrewSchedule;
  /** When fermentation and conditioning began (ms), if reached. */
  fermentingAt: number | null;
  conditioningAt: number | null;
  /** Fermenting batches: the forecast's finish (ms), when the gravity log gives one. */
  forecastFinish: number | null;
  /** The fermenter booking made for it, if any (ms). */
  booking: { start: number; end: number } | null;
}

/** Where a batch is expected to be over time, and whether it will hand its fermenter back early. */
export interface BatchOccupancy {
  start: number;
  /** Expected end of packaging. */
  end: number;
  /** The end the plan or the booking counted on. */
  plannedEnd: number;
  phases: PlacedPhase[];
  /** Whole days the expected end comes before the planned one; null when not early. */
  freesEarlyByDays: number | null;
}

/** The phases after fermentation, laid out from the moment fermentation ends; a batch still in the fermenter conditions at least until `now`. */
function afterFermentation(fermentationEnd: number, schedule: BrewSchedule, now: number): PlacedPhase[] {
  const conditioningEnd = Math.max(fermentationEnd + schedule.conditioningDays * DAY_MS, now);
  return [
    { phase: 'conditioning', start: fermentationEnd, end: conditioningEnd },
    { phase: 'packaging', start: conditioningEnd, end: conditioningEnd + DAY_MS },
  ];
}

/**
 * A batch's occupancy: planned and brewing batches follow their schedule from the brew date;
 * a fermenting batch's fermentation ends when its forecast says (else after the planned days from
 * when it began); a conditioning batch counts its conditioning days from when it began. A batch
 * past its expected end still holds the fermenter: it is shown conditioning until `now`.
 */
export function batchOccupancy(batch: OccupyingBatch, zone: string, now: number): BatchOccupancy {
  const planned = placeSchedule(batch.brewDate, batch.schedule, zone);
  const plannedEnd = batch.booking?.end ?? planned.end;
  const start = batch.booking?.start ?? planned.start;
  let phases = planned.phases;
  if (batch.status === 'fermenting') {
    const began = batch.fermentingAt ?? planned.phases[1].start;
    const fermentationEnd = batch.forecastFinish ?? began + batch.schedule.fermentationDays * DAY_MS;
    phases = [...planned.phases.filter((p) => p.phase === 'brew' && p.end <= began), { phase: 'fermentation', start: began, end: Math.max(fermentationEnd, began) }, ...afterFermentation(Math.max(fermentationEnd, began), batch.schedule, now)];
  } else if (batch.status === 'conditioning') {
    const began = batch.conditioningAt ?? planned.phases[2]?.start ?? planned.start;
    phases = [...planned.phases.filter((p) => p.end <= began), ...afterFermentation(began, batch.schedule, now)];
  }
  const phasesInOrder = phases.filter((p) => p.end > p.start);
  const end = phasesInOrder.length ? phasesInOrder[phasesInOrder.length - 1].end : planned.end;
  const earlyDays = Math.floor((plannedEnd - end) / DAY_MS);
  const forecastBased = batch.status === 'fermenting' && batch.forecastFinish !== null;
  return { start: Math.min(start, phasesInOrder[0]?.start ?? start), end, plannedEnd, phases: phasesInOrder, freesEarlyByDays: forecastBased && earlyDays >= 1 ? earlyDays : null };
}
