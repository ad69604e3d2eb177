import { BookingConflict } from '../bookings/bookings-api';
import { BatchStatus } from '../batches/batch-status';
import { BrewSchedule, PlanPhaseName, ScheduleBasis } from './brew-schedule';
import { LeftOutFermenter } from './left-out-fermenters';
import { Utilisation } from './utilisation';

export const BREW_PLAN_PATH = '/api/brew-plan';

/*
 * Routes (roles in brackets; "any" = any signed-in person):
 *   GET   /api/brew-plan/timeline?from=&weeks=      [any]             BrewPlanTimeline (from: yyyy-MM-dd, co-op zone)
 *   GET   /api/brew-plan/brewers                    [admin]           BrewerChoice[] (active members with the brewer role)
 *   POST  /api/brew-plan/proposals                  [admin, brewer]   ProposalRequest → SlotProposals
 *   POST  /api/brew-plan/batches                    [admin, brewer]   AcceptSlotRequest → PlannedBatch (201); 409 booking-conflict
 *   PATCH /api/brew-plan/batches/:batchId           [admin, brewer]   MovePlannedBatchRequest → PlannedBatch; 409 booking-conflict
 */

/** A phase on the timeline; instants ISO 8601 UTC. */
export interface TimelinePhase {
  phase: PlanPhaseName;
  start: string;
  end: string;
}

/** One thing on a fermenter's lane: a batch (with its phases), a booking or a maintenance block. */
export interface TimelineEntry {
  kind: 'batch' | 'booking' | 'maintenance';
  label: string;
  start: string;
  end: string;
  /** End of the cleaning turnaround after it, when held. */
  heldUntil: string | null;
  bookingId: number | null;
  batchId: number | null;
  batchStatus: BatchStatus | null;
  phases: TimelinePhase[];
  /** Fermenting batches: when the gravity log's forecast says fermentation finishes. */
  forecastFinish: string | null;
  /** Whole days the fermenter frees up before its planned end, by the forecast; null when not early. */
  freesEarlyByDays: number | null;
}

export interface TimelineLane {
  kitItemId: number;
  code: string;
  name: string;
  capacityLitres: number | null;
  inService: boolean;
  turnaroundHours: number;
  entries: TimelineEntry[];
  utilisation: Utilisation;
}

export interface BrewPlanTimeline {
  /** First and last day shown, yyyy-MM-dd in `timeZone`. */
  from: string;
  to: string;
  timeZone: string;
  lanes: TimelineLane[];
  room: Utilisation;
}

/** A schedule the brewer sets; left out, the recipe's yeast decides. */
export interface ScheduleOverride {
  fermentationDays?: number;
  conditioningDays?: number;
}

export interface ProposalRequest extends ScheduleOverride {
  recipeId: number;
  recipeVersion: number;
  volumeLitres: number;
  /** Any day of the wanted week, yyyy-MM-dd. */
  wantedWeek: string;
}

export interface SlotProposal {
  kitItemId: number;
  kitItemCode: string;
  kitItemName: string;
  capacityLitres: number;
  brewDate: string;
  /** Wall-clock times of the fermenter booking, yyyy-MM-ddTHH:mm in the co-op's zone. */
  startLocal: string;
  endLocal: string;
  heldUntil: string;
  phases: TimelinePhase[];
}

export interface SlotProposals {
  recipeName: string;
  schedule: BrewSchedule;
  basis: ScheduleBasis;
  /** Monday of the wanted week. */
  weekStart: string;
  proposals: SlotProposal[];
  /** Each fermenter not proposed, with why (held by a batch, too small, out of service, no free slot). */
  leftOut: LeftOutFermenter[];
}

export interface AcceptSlotRequest extends BrewSchedule {
  /** Whose batch it is; admins only may name an active brewer other than themselves. Left out: the caller. */
  brewerId?: number;
  name: string;
  recipeId: number;
  recipeVersion: number;
  volumeLitres: number;
  kitItemId: number;
  brewDate: string;
}

export interface MovePlannedBatchRequest {
  brewDate: string;
  /** Another fermenter; left out, the batch stays on its own. */
  kitItemId?: number;
}

export interface PlannedBatch {
  batchId: number;
  bookingId: number;
  kitItemId: number;
  kitItemCode: string;
  brewDate: string;
  startLocal: string;
  endLocal: string;
}

export type { BookingConflict };
